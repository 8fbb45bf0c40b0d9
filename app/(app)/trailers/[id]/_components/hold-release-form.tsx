'use client';

import { useActionState } from 'react';
import { Button } from '@/app/_components/button';
import { Field, FormError } from '@/app/_components/field';
import { releaseHoldAction, type ReleaseState } from '../../actions';

export function HoldReleaseForm({
  holdId,
  trailerId,
  reason,
  nowLocal,
}: {
  holdId: string;
  trailerId: string;
  reason: string;
  nowLocal: string;
}) {
  const [state, action, isPending] = useActionState<ReleaseState, FormData>(releaseHoldAction, { ok: false });
  if (state.ok)
    return (
      <p role="status" className="rounded-lg bg-ok-bg p-2 text-gate font-bold text-ok">
        {state.message}
      </p>
    );
  const e = state.fieldErrors ?? {};
  return (
    <form action={action} className="space-y-2" aria-label={`Release hold: ${reason}`}>
      <input type="hidden" name="holdId" value={holdId} />
      <input type="hidden" name="trailerId" value={trailerId} />
      <Field
        label="Repaired by"
        name="repairedBy"
        id={`repairedBy-${holdId}`}
        required
        error={e.repairedBy}
        hint="Technician or shop"
      />
      <Field
        label="What was repaired"
        name="repairNote"
        id={`repairNote-${holdId}`}
        required
        error={e.repairNote}
      />
      <Field
        label="When (terminal time)"
        name="repairedAt"
        id={`repairedAt-${holdId}`}
        type="datetime-local"
        required
        defaultValue={nowLocal}
        error={e.repairedAt}
      />
      <FormError message={state.formError} />
      <Button type="submit" disabled={isPending}>
        {isPending ? 'Saving…' : 'Record repair and release'}
      </Button>
    </form>
  );
}
