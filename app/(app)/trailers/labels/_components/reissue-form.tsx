'use client';

import { useActionState } from 'react';
import { Button } from '@/app/_components/button';
import { FormError } from '@/app/_components/field';
import { reissueLabelAction } from '../actions';

/** Re-issue asks once more in words: the label on the trailer stops working at once. */
export function ReissueForm({ trailerId, unitNumber }: { trailerId: string; unitNumber: string }) {
  const [state, action, pending] = useActionState(reissueLabelAction, null);
  return (
    <form action={action} className="space-y-2 rounded-xl bg-paper p-4">
      <h2 className="text-gate-lg font-bold">Re-issue this label</h2>
      <p className="text-gate">
        Use this when the label on {unitNumber} is torn, faded or lost. The old label stops working at once; a
        driver who scans it is told to use the new one.
      </p>
      <input type="hidden" name="trailerId" value={trailerId} />
      <FormError message={state?.formError} />
      <Button type="submit" variant="danger" disabled={pending}>
        {pending ? 'Re-issuing…' : 'Re-issue label'}
      </Button>
    </form>
  );
}
