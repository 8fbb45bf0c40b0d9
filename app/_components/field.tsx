'use client';

import type { ComponentProps, ReactNode } from 'react';
import { useFieldError, useTypedValue } from './form-state';

const control =
  'mt-1 block min-h-tap w-full rounded-lg border-2 border-paper-line bg-paper px-3 text-gate aria-[invalid=true]:border-danger';

type Labelled = { label: string; name: string; error?: string[]; hint?: string; className?: string };

/** Label, hint, the control and its first error, wired with aria-describedby and aria-invalid. */
function Frame({
  label,
  id,
  hint,
  messages,
  className = '',
  children,
}: {
  label: string;
  id: string;
  hint?: string;
  messages?: string[];
  className?: string;
  children: (aria: { 'aria-invalid'?: true; 'aria-describedby'?: string }) => ReactNode;
}) {
  const errorId = `${id}-error`;
  const hintId = `${id}-hint`;
  const describedBy = [hint ? hintId : null, messages?.length ? errorId : null].filter(Boolean).join(' ');
  return (
    <div className={className}>
      <label htmlFor={id} className="block text-gate font-bold">
        {label}
      </label>
      {hint ? (
        <p id={hintId} className="text-gate-sm text-ink-soft">
          {hint}
        </p>
      ) : null}
      {children({
        ...(messages?.length ? { 'aria-invalid': true as const } : {}),
        ...(describedBy ? { 'aria-describedby': describedBy } : {}),
      })}
      <FieldError id={errorId} messages={messages} />
    </div>
  );
}

/** A labelled input whose first error shows under it. Inside an ActionForm it finds its own error. */
export function Field({ label, name, error, hint, className, ...input }: ComponentProps<'input'> & Labelled) {
  const messages = useFieldError(name, error);
  const typed = useTypedValue(name);
  const id = input.id ?? name;
  return (
    <Frame label={label} id={id} hint={hint} messages={messages} className={className}>
      {(aria) => (
        <input
          id={id}
          name={name}
          className={control}
          {...input}
          {...aria}
          {...(typed !== undefined && input.value === undefined && input.type !== 'hidden'
            ? { defaultValue: typed }
            : {})}
        />
      )}
    </Frame>
  );
}

export function Select({
  label,
  name,
  error,
  hint,
  className,
  children,
  ...select
}: ComponentProps<'select'> & Labelled) {
  const messages = useFieldError(name, error);
  const typed = useTypedValue(name);
  const id = select.id ?? name;
  return (
    <Frame label={label} id={id} hint={hint} messages={messages} className={className}>
      {(aria) => (
        <select
          // React applies a select's defaultValue only when it mounts, so a new typed value remounts it
          key={typed}
          id={id}
          name={name}
          className={control}
          {...select}
          {...aria}
          {...(typed !== undefined && select.value === undefined ? { defaultValue: typed } : {})}
        >
          {children}
        </select>
      )}
    </Frame>
  );
}

export function Textarea({
  label,
  name,
  error,
  hint,
  className,
  ...area
}: ComponentProps<'textarea'> & Labelled) {
  const messages = useFieldError(name, error);
  const typed = useTypedValue(name);
  const id = area.id ?? name;
  return (
    <Frame label={label} id={id} hint={hint} messages={messages} className={className}>
      {(aria) => (
        <textarea
          id={id}
          name={name}
          rows={3}
          className={`${control} py-2`}
          {...area}
          {...aria}
          {...(typed !== undefined && area.value === undefined ? { defaultValue: typed } : {})}
        />
      )}
    </Frame>
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
