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
import { QueuedMoves } from './queued-moves';

type Result =
  | { ok: true; unitNumber: string; fromLabel: string | null; toLabel: string; isOutOfService: boolean }
  | { ok: 'queued'; unit: string; target: string }
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
    // the schema and zod load with the first move, not with the page (the jockey pages' JS budget)
    const [{ z }, { moveSchema }, { addToOutbox }] = await Promise.all([
      import('zod'),
      import('@/lib/validation/yard'),
      import('@/app/_components/offline/outbox-client'),
    ]);
    const parsed = moveSchema.safeParse({
      ...Object.fromEntries(new FormData(form)),
      clientKey: crypto.randomUUID(),
      // the time of the move: a queued move is recorded at this time, not when it reaches the server
      madeAt: new Date().toISOString(),
    });
    if (!parsed.success) {
      const found = z.flattenError(parsed.error).fieldErrors as Record<string, string[]>;
      const fieldErrors = Object.fromEntries(
        Object.entries(found).map(([k, list]) => [k, list.map((m) => say(m))]),
      );
      setResult({ ok: false, message: t('move.notRecorded'), fieldErrors });
      return;
    }
    const body = parsed.data;
    // without signal the move waits in the phone's outbox under its key and is sent once later
    const queue = async () => {
      await addToOutbox({
        key: body.clientKey!,
        kind: 'move',
        group: 'yard-moves',
        url: '/api/yard/moves',
        body,
        meta: { unit: body.unit, target: body.target },
      });
      setResult({ ok: 'queued', unit: body.unit, target: body.target });
      form.reset();
    };
    if (!navigator.onLine) return queue();
    setPending(true);
    try {
      const res = await fetch('/api/yard/moves', {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify(body),
      });
      // reached, but the server could not answer: the outbox retries under the same key
      if (res.status >= 500) return await queue();
      const answer = await res.json();
      if (res.ok) {
        setResult({ ok: true, ...answer });
        form.reset();
        await mutate(BOARD_KEY);
      } else {
        setResult({
          ok: false,
          message: answer.message
            ? say(answer.message, answer.messageKey, answer.messageValues)
            : t('move.notRecorded'),
          fieldErrors: answer.fieldErrors
            ? Object.fromEntries(
                Object.entries(answer.fieldErrors as Record<string, string[]>).map(([k, list]) => [
                  k,
                  list.map((m) => say(m)),
                ]),
              )
            : undefined,
        });
      }
    } catch {
      await queue();
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
      {/* the move's time is no input of its own: its refusal shows with the form's */}
      <FormError
        message={errors.madeAt?.[0] ?? (result && !result.ok && !result.fieldErrors ? result.message : null)}
      />
      <div aria-live="polite">
        {result?.ok === 'queued' ? (
          <p
            role="status"
            className="rounded-lg border-2 border-warn bg-warn-bg p-3 text-gate font-bold text-warn"
          >
            {t('move.queued', { unit: result.unit, to: result.target })}
          </p>
        ) : result?.ok ? (
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
      <QueuedMoves />
    </form>
  );
}
