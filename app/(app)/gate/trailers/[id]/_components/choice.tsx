'use client';

type Option<T> = { value: T; label: string; tone?: 'ok' | 'warn' | 'danger' };

const TONES = {
  ok: 'aria-pressed:bg-ok aria-pressed:border-ok',
  warn: 'aria-pressed:bg-warn aria-pressed:border-warn',
  danger: 'aria-pressed:bg-danger aria-pressed:border-danger',
} as const;

/** Big one-tap choice buttons (gloves): a labelled group of toggle buttons, one pressed at a time. */
export function Choice<T extends string | number | boolean>({
  label,
  options,
  value,
  onChange,
  columns = 0,
  hideLabel = false,
  errorId,
}: {
  label: string;
  options: Option<T>[];
  value: T | null | undefined;
  onChange: (v: T) => void;
  columns?: number;
  hideLabel?: boolean;
  /** The id of the message under the group when it has one: the group is then marked for focus. */
  errorId?: string;
}) {
  return (
    <div role="group" aria-label={label} aria-describedby={errorId} data-invalid={errorId ? true : undefined}>
      {hideLabel ? null : <p className="text-gate font-bold">{label}</p>}
      <div
        className={columns ? 'mt-1 grid gap-2' : 'mt-1 flex flex-wrap gap-2'}
        style={columns ? { gridTemplateColumns: `repeat(${columns}, minmax(0, 1fr))` } : undefined}
      >
        {options.map((o) => (
          <button
            key={String(o.value)}
            type="button"
            aria-pressed={value === o.value}
            onClick={() => onChange(o.value)}
            className={`min-h-tap min-w-tap rounded-lg border-2 border-ink-soft bg-paper px-3 text-gate font-bold text-ink aria-pressed:text-on-fill ${o.tone ? TONES[o.tone] : 'aria-pressed:border-brand aria-pressed:bg-brand'}`}
          >
            {o.label}
          </button>
        ))}
      </div>
    </div>
  );
}

export const YES_NO = (yes: string, no: string, noTone: 'warn' | 'danger' = 'danger'): Option<boolean>[] => [
  { value: true, label: yes, tone: 'ok' },
  { value: false, label: no, tone: noTone },
];
