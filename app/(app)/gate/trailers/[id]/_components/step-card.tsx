'use client';

import type { ReactNode } from 'react';

/**
 * One step of the gate form. Open: its heading, its questions and a button to the next step.
 * Folded: one line (title and the answers given) that opens it again on a tap.
 */
export function StepCard({
  id,
  number,
  title,
  summary,
  isOpen,
  isComplete,
  onOpen,
  onNext,
  nextLabel,
  children,
}: {
  id: string;
  number: number;
  title: string;
  summary: string;
  isOpen: boolean;
  isComplete: boolean;
  onOpen: () => void;
  onNext?: () => void;
  nextLabel?: string;
  children: ReactNode;
}) {
  if (!isOpen) {
    return (
      <button
        type="button"
        onClick={onOpen}
        data-step={id}
        aria-label={`${number}. ${title}: ${summary}`}
        className={`flex min-h-tap w-full items-center gap-3 rounded-lg border-2 px-3 py-2 text-left text-gate ${isComplete ? 'border-ok' : 'border-paper-line'}`}
      >
        <span aria-hidden="true" className="font-bold">
          {number}.
        </span>
        <span className="font-bold">{title}</span>
        <span className="min-w-0 flex-1 truncate text-gate-sm text-ink-soft">{summary}</span>
      </button>
    );
  }
  return (
    <section
      id={`step-${id}`}
      data-step={id}
      aria-labelledby={`step-${id}-title`}
      className="space-y-4 rounded-lg border-2 border-brand p-3"
    >
      <h2 id={`step-${id}-title`} className="text-gate-xl font-bold">
        {number}. {title}
      </h2>
      {children}
      {onNext && nextLabel ? (
        <button
          type="button"
          onClick={onNext}
          className="min-h-tap-lg w-full rounded-lg border-2 border-brand bg-paper px-3 text-gate-lg font-bold text-brand"
        >
          {nextLabel}
        </button>
      ) : null}
    </section>
  );
}
