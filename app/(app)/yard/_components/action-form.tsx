'use client';

import { useActionState } from 'react';
import type { ActionState } from '@/lib/yard/result';

/** A small form posting to a server action; shows the action's message beside the button. */
export function ActionForm({
  action,
  children,
  submitLabel,
  variant = 'primary',
  className = '',
}: {
  action: (prev: ActionState, data: FormData) => Promise<ActionState>;
  children?: React.ReactNode;
  submitLabel: string;
  variant?: 'primary' | 'secondary' | 'danger';
  className?: string;
}) {
  const [state, formAction, pending] = useActionState(action, { ok: false });
  const colours = {
    primary: 'bg-brand text-white',
    secondary: 'border-2 border-brand bg-paper text-brand',
    danger: 'bg-danger text-white',
  }[variant];
  return (
    <form action={formAction} className={`flex flex-wrap items-end gap-2 ${className}`}>
      {children}
      <button
        type="submit"
        disabled={pending}
        className={`min-h-tap rounded-lg px-4 text-gate-sm font-bold disabled:opacity-60 ${colours}`}
      >
        {pending ? '…' : submitLabel}
      </button>
      <p
        aria-live="polite"
        className={`w-full text-gate-sm font-bold ${state.ok ? 'text-ok' : 'text-danger'}`}
      >
        {state.message ?? ''}
      </p>
    </form>
  );
}
