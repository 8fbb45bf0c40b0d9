'use client';

import { useTranslations } from 'next-intl';
import { useMemo, useRef, useState } from 'react';
import { ActionForm } from '@/app/_components/action-form';
import { Button } from '@/app/_components/button';
import { Field, Select } from '@/app/_components/field';
import { useRefusalText } from '@/app/_components/use-refusal-text';
import { pendingCount } from '@/lib/yard/scan-queue';
import { suggestNextSpot, type WalkSpot } from '@/lib/yard/walk';
import { finishWalkAction } from '../../actions';
import { CameraButton } from '../../../_components/camera-button';
import { QuickCheckFields, readQuickChecks } from './quick-checks';
import { useScanQueue } from './use-scan-queue';

type Stored = { clientKey: string; text: string; unitNumber: string | null; spotLabel: string | null };

export function WalkScanner({
  walkId,
  spots,
  stored,
}: {
  walkId: string;
  spots: WalkSpot[];
  stored: Stored[];
}) {
  const t = useTranslations('Walk');
  const say = useRefusalText();
  const { queue, isOnline, add } = useScanQueue(walkId);
  const [lastSpotId, setLastSpotId] = useState<string | null>(null);
  const [errors, setErrors] = useState<{ unit?: string[]; spotId?: string[] }>({});
  const unitRef = useRef<HTMLInputElement>(null);
  const suggested = suggestNextSpot(
    spots,
    lastSpotId ?? (queue.length ? queue[queue.length - 1].spotId : null),
  );
  const waiting = pendingCount(queue);
  const others = useMemo(
    () => stored.filter((s) => !queue.some((q) => q.clientKey === s.clientKey)),
    [stored, queue],
  );

  function record(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = e.currentTarget;
    const data = new FormData(form);
    const text = String(data.get('unit') ?? '').trim();
    const spot = spots.find((s) => s.id === data.get('spotId'));
    const missing = {
      ...(text ? {} : { unit: [t('unitFirst')] }),
      ...(spot ? {} : { spotId: [t('slotFirst')] }),
    };
    setErrors(missing);
    if (!text || !spot) return;
    add({
      clientKey: crypto.randomUUID(),
      scannedText: text,
      spotId: spot.id,
      spotLabel: spot.label,
      scannedAt: new Date().toISOString(),
      state: 'pending',
      ...readQuickChecks(data),
    });
    setLastSpotId(spot.id);
    form.reset();
    unitRef.current?.focus();
  }

  return (
    <div className="space-y-3">
      <p
        role="status"
        className={`rounded-lg p-2 text-gate-sm font-bold ${isOnline ? 'bg-ok-bg text-ok' : 'bg-warn-bg text-warn'}`}
      >
        {isOnline ? t('online') : t('offline')}
        {waiting ? ` · ${t('waiting', { count: waiting })}` : ''}
      </p>
      <form
        onSubmit={record}
        noValidate
        className="space-y-2 rounded-xl bg-paper p-4 shadow"
        key={suggested?.id ?? 'end'}
      >
        <Field
          ref={unitRef}
          autoFocus
          label={t('unit')}
          name="unit"
          autoComplete="off"
          autoCapitalize="characters"
          placeholder={t('unitPlaceholder')}
          error={errors.unit}
        />
        <CameraButton
          label={t('scanLabel')}
          onText={(text) => {
            if (unitRef.current) unitRef.current.value = text;
          }}
        />
        <Select label={t('slot')} name="spotId" defaultValue={suggested?.id ?? ''} error={errors.spotId}>
          <option value="">{t('chooseSlot')}</option>
          {spots.map((s) => (
            <option key={s.id} value={s.id}>
              {s.label}
            </option>
          ))}
        </Select>
        <QuickCheckFields />
        <Button type="submit">{t('record')}</Button>
      </form>
      <section aria-labelledby="scans-title">
        <h2 id="scans-title" className="text-gate-lg font-bold">
          {t('scans', { count: queue.length + others.length })}
        </h2>
        <ol className="space-y-1" aria-label={t('scansLabel')}>
          {others.map((s) => (
            <li key={s.clientKey} className="rounded bg-paper px-3 py-1 text-gate-sm">
              {s.spotLabel}: {s.unitNumber ?? t('unknownUnit', { text: s.text })} · {t('state.sent')}
            </li>
          ))}
          {queue.map((q) => (
            <li
              key={q.clientKey}
              className={`rounded px-3 py-1 text-gate-sm ${q.state === 'rejected' ? 'bg-danger-bg text-danger' : 'bg-paper'}`}
            >
              {q.spotLabel}:{' '}
              {q.state === 'sent' ? (q.result ?? t('unknownUnit', { text: q.scannedText })) : q.scannedText} ·{' '}
              {t(`state.${q.state}`)}
              {q.error ? `: ${say(q.error)}` : ''}
            </li>
          ))}
        </ol>
      </section>
      <ActionForm
        action={finishWalkAction}
        submitLabel={waiting > 0 ? t('finishWaiting') : t('finish')}
        pendingLabel={t('reconciling')}
        variant="secondary"
        disabled={waiting > 0}
        hidden={{ walkId }}
      />
    </div>
  );
}
