'use client';

import { useTranslations } from 'next-intl';
import { useState } from 'react';
import { useSWRConfig } from 'swr';
import { Button } from '@/app/_components/button';
import { Caution } from '@/app/_components/caution';
import { Field, FormError } from '@/app/_components/field';
import { useRefusalText } from '@/app/_components/use-refusal-text';
import { CameraButton } from '../../_components/camera-button';
import { BOARD_KEY } from '../../_components/use-board';

type Result =
  | { ok: true; unitNumber: string; fromLabel: string | null; toLabel: string; isOutOfService: boolean }
  | { ok: false; message: string; fieldErrors?: Record<string, string[]> };

export function MoveForm({ units, freeSpots }: { units: string[]; freeSpots: string[] }) {
  const t = useTranslations('Yard');
  const c = useTranslations('Cautions');
  const say = useRefusalText();
  const { mutate } = useSWRConfig();
  const [result, setResult] = useState<Result | null>(null);
  const [pending, setPending] = useState(false);

  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = e.currentTarget;
    const data = Object.fromEntries(new FormData(form));
    setPending(true);
    try {
      const res = await fetch('/api/yard/moves', {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify(data),
      });
      const body = await res.json();
      if (res.ok) {
        setResult({ ok: true, ...body });
        form.reset();
        await mutate(BOARD_KEY);
      } else {
        setResult({
          ok: false,
          message: body.message
            ? say(body.message, body.messageKey, body.messageValues)
            : t('move.notRecorded'),
          fieldErrors: body.fieldErrors
            ? Object.fromEntries(
                Object.entries(body.fieldErrors as Record<string, string[]>).map(([k, list]) => [
                  k,
                  list.map((m) => say(m)),
                ]),
              )
            : undefined,
        });
      }
    } catch {
      setResult({ ok: false, message: t('move.noConnection') });
    } finally {
      setPending(false);
    }
  }

  function fill(text: string, name: 'unit' | 'target') {
    const input = document.querySelector<HTMLInputElement>(`form[data-move] input[name="${name}"]`);
    if (input) input.value = text.trim();
  }

  const errors = result && !result.ok ? (result.fieldErrors ?? {}) : {};
  return (
    <form data-move onSubmit={submit} noValidate className="space-y-2 rounded-xl bg-paper p-4 shadow">
      <Field
        label={t('move.unit')}
        name="unit"
        list="yard-units"
        autoCapitalize="characters"
        autoComplete="off"
        required
        hint={t('move.unitHint')}
        error={errors.unit}
      />
      <CameraButton label={t('move.scanUnit')} onText={(text) => fill(text, 'unit')} />
      <datalist id="yard-units">
        {units.map((u) => (
          <option key={u} value={u} />
        ))}
      </datalist>
      <Field
        label={t('move.target')}
        name="target"
        list="free-spots"
        autoCapitalize="characters"
        autoComplete="off"
        required
        error={errors.target}
      />
      <CameraButton label={t('move.scanTarget')} onText={(text) => fill(text, 'target')} />
      <datalist id="free-spots">
        {freeSpots.map((s) => (
          <option key={s} value={s} />
        ))}
      </datalist>
      <Button type="submit" disabled={pending}>
        {pending ? t('move.pending') : t('move.submit')}
      </Button>
      <FormError message={result && !result.ok && !result.fieldErrors ? result.message : null} />
      <div aria-live="polite">
        {result?.ok ? (
          <div className="space-y-2">
            <p
              role="status"
              className="rounded-lg border-2 border-ok bg-ok-bg p-3 text-gate font-bold text-ok"
            >
              {result.fromLabel
                ? t('move.movedFrom', { unit: result.unitNumber, from: result.fromLabel, to: result.toLabel })
                : t('move.moved', { unit: result.unitNumber, to: result.toLabel })}
            </p>
            {result.isOutOfService ? (
              <Caution title={c('titles.outOfService')}>
                {t('move.oosHold', { unit: result.unitNumber })} {c('outOfService')} {t('move.noPublicRoad')}
              </Caution>
            ) : null}
          </div>
        ) : null}
      </div>
    </form>
  );
}
