import type { ComponentProps } from 'react';

/** A labelled input whose first error shows under it, linked with aria-describedby. */
export function Field({
  label,
  name,
  error,
  hint,
  className = '',
  ...input
}: ComponentProps<'input'> & { label: string; name: string; error?: string[]; hint?: string }) {
  const errorId = `${name}-error`;
  const hintId = `${name}-hint`;
  const describedBy =
    [hint ? hintId : null, error?.length ? errorId : null].filter(Boolean).join(' ') || undefined;
  return (
    <div className={className}>
      <label htmlFor={input.id ?? name} className="block text-gate font-bold">
        {label}
      </label>
      {hint ? (
        <p id={hintId} className="text-gate-sm text-ink-soft">
          {hint}
        </p>
      ) : null}
      <input
        id={input.id ?? name}
        name={name}
        aria-invalid={error?.length ? true : undefined}
        aria-describedby={describedBy}
        className="mt-1 block min-h-tap w-full rounded-lg border-2 border-paper-line bg-paper px-3 text-gate aria-[invalid=true]:border-danger"
        {...input}
      />
      <FieldError id={errorId} messages={error} />
    </div>
  );
}

export function FieldError({ id, messages }: { id: string; messages?: string[] }) {
  return (
    <p id={id} aria-live="polite" className="mt-1 min-h-6 text-gate-sm font-bold text-danger">
      {messages?.[0] ?? ''}
    </p>
  );
}

export function FormError({ message }: { message?: string | null }) {
  return (
    <div aria-live="polite" role="status">
      {message ? (
        <p className="rounded-lg border-2 border-danger bg-danger-bg p-3 text-gate font-bold text-danger">
          {message}
        </p>
      ) : null}
    </div>
  );
}
