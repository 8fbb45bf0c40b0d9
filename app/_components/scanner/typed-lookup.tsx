'use client';

import { useTranslations } from 'next-intl';
import { useState, type FormEvent } from 'react';
import { Button } from '@/app/_components/button';
import { normalizeScannedVin } from '@/lib/labels/scan-text';
import type { LookupQuery } from './lookup';

/** Typed fallback: one large field for a unit number or a VIN (17 characters means VIN). */
export function typedQuery(raw: string): LookupQuery | null {
  const text = raw.trim();
  if (!text) return null;
  const vin = normalizeScannedVin(text);
  return /^[A-Z0-9]{17}$/.test(vin) ? { vin } : { unit: text.toUpperCase() };
}

export function TypedLookup({
  onLookup,
  isBusy,
  initial = '',
}: {
  onLookup: (q: LookupQuery) => void;
  isBusy: boolean;
  initial?: string;
}) {
  const t = useTranslations('Common');
  const [value, setValue] = useState(initial);
  function submit(event: FormEvent) {
    event.preventDefault();
    const query = typedQuery(value);
    if (query) onLookup(query);
  }
  return (
    <form onSubmit={submit} className="space-y-2" role="search" aria-label={t('scanner.typeLabel')}>
      <label htmlFor="typed-trailer" className="block text-gate font-bold">
        {t('scanner.typeTitle')}
      </label>
      <p id="typed-trailer-hint" className="text-gate-sm text-ink-soft">
        {t('scanner.typeHint')}
      </p>
      <input
        id="typed-trailer"
        value={value}
        onChange={(e) => setValue(e.target.value)}
        autoCapitalize="characters"
        autoComplete="off"
        spellCheck={false}
        inputMode="text"
        maxLength={40}
        placeholder="R53012"
        aria-describedby="typed-trailer-hint"
        className="block min-h-tap-lg w-full rounded-lg border-2 border-paper-line bg-paper px-3 font-mono text-gate-xl uppercase"
      />
      <Button type="submit" variant="secondary" className="w-full" disabled={isBusy || !value.trim()}>
        {t('scanner.find')}
      </Button>
    </form>
  );
}
