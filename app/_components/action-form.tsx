'use client';

import { useTranslations } from 'next-intl';
import { useActionState, type ReactNode } from 'react';
import { IDLE, type ActionState } from '@/lib/result';
import { Button } from './button';
import { FormError } from './field';
import { FormStateProvider } from './form-state';

type Action = (prev: ActionState, form: FormData) => Promise<ActionState>;

/**
 * A form posting to a server action made with `formAction()`. Fields inside it (Field, Select,
 * Textarea) show their own messages under them; the summary and the success message sit above
 * the button, and the button says when it is working.
 */
export function ActionForm({
  action,
  submitLabel,
  pendingLabel,
  title,
  ariaLabel,
  hidden,
  variant = 'primary',
  className = '',
  disabled = false,
  children,
}: {
  action: Action;
  submitLabel: string;
  pendingLabel?: string;
  title?: string;
  /** The form's name for assistive technology when it shows no title. */
  ariaLabel?: string;
  hidden?: Record<string, string>;
  variant?: 'primary' | 'secondary' | 'danger';
  className?: string;
  /** Holds the button back (for example while something else must happen first). */
  disabled?: boolean;
  children?: ReactNode;
}) {
  const t = useTranslations('Common');
  const [state, run, isPending] = useActionState(action, IDLE);
  return (
    <FormStateProvider value={state}>
      <form action={run} aria-label={title ?? ariaLabel} className={`space-y-2 ${className}`}>
        {title ? <h3 className="text-gate-lg font-bold">{title}</h3> : null}
        {Object.entries(hidden ?? {}).map(([name, value]) => (
          <input key={name} type="hidden" name={name} value={value} />
        ))}
        {children}
        <FormError message={state.ok ? null : state.formError} />
        {state.ok && state.message ? (
          <p role="status" className="rounded-lg bg-ok-bg p-2 text-gate font-bold text-ok">
            {state.message}
          </p>
        ) : null}
        <Button type="submit" disabled={isPending || disabled} variant={variant}>
          {isPending ? (pendingLabel ?? t('saving')) : submitLabel}
        </Button>
      </form>
    </FormStateProvider>
  );
}
