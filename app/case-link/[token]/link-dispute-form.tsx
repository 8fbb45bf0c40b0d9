'use client';

import { useActionState } from 'react';
import { Button } from '@/app/_components/button';
import { FormError } from '@/app/_components/field';
import { disputeByLinkAction } from '../actions';

export function LinkDisputeForm({ token }: { token: string }) {
  const [state, action, isPending] = useActionState(disputeByLinkAction, { ok: false });
  if (state.ok)
    return (
      <p role="status" className="rounded-lg bg-ok-bg p-3 text-gate font-bold text-ok">
        {state.message}
      </p>
    );
  return (
    <form action={action} className="space-y-2 rounded-xl bg-paper p-3" aria-label="Dispute this case">
      <input type="hidden" name="token" value={token} />
      <label htmlFor="note" className="block text-gate font-bold">
        Why is this damage not yours?
      </label>
      <textarea
        id="note"
        name="note"
        rows={4}
        required
        minLength={10}
        aria-describedby="note-error"
        className="block w-full rounded-lg border-2 border-paper-line p-2 text-gate"
      />
      <p id="note-error" aria-live="polite" className="text-gate-sm font-bold text-danger">
        {state.fieldErrors?.note?.[0] ?? ''}
      </p>
      <FormError message={state.formError} />
      <Button type="submit" disabled={isPending}>
        {isPending ? 'Sending…' : 'Send dispute'}
      </Button>
    </form>
  );
}
