'use client';

import { useActionState } from 'react';
import { Button } from '@/app/_components/button';
import { FormError } from '@/app/_components/field';
import type { CaseActionState } from '../../../actions';

type Action = (prev: CaseActionState, formData: FormData) => Promise<CaseActionState>;

/** One case command as a form: hidden case id, the given fields, a pending-aware submit, messages. */
export function ActionForm({
  action,
  caseId,
  submit,
  title,
  children,
  variant,
}: {
  action: Action;
  caseId: string;
  submit: string;
  title: string;
  children?: React.ReactNode;
  variant?: 'primary' | 'secondary' | 'danger';
}) {
  const [state, formAction, isPending] = useActionState(action, { ok: false });
  const err = (name: string) => state.fieldErrors?.[name]?.[0];
  return (
    <form action={formAction} className="space-y-2 rounded-xl bg-paper p-3" aria-label={title}>
      <h3 className="text-gate-lg font-bold">{title}</h3>
      <input type="hidden" name="caseId" value={caseId} />
      {children}
      {['amount', 'reason', 'note', 'decision'].map((n) =>
        err(n) ? (
          <p key={n} aria-live="polite" className="text-gate-sm font-bold text-danger">
            {err(n)}
          </p>
        ) : null,
      )}
      <FormError message={state.ok ? null : state.formError} />
      {state.ok && state.message ? (
        <p role="status" className="rounded-lg bg-ok-bg p-2 text-gate font-bold text-ok">
          {state.message}
        </p>
      ) : null}
      <Button type="submit" disabled={isPending} variant={variant}>
        {isPending ? 'Saving…' : submit}
      </Button>
    </form>
  );
}

export const inputClass =
  'mt-1 block min-h-tap w-full rounded-lg border-2 border-paper-line bg-paper px-3 text-gate';
