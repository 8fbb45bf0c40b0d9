'use client';

import { useState } from 'react';
import type { Draft } from '@/lib/handoffs/draft';
import {
  firstStepWithError,
  isStepComplete,
  nextStep,
  type StepContext,
  type StepKey,
} from '@/lib/handoffs/steps';

type Seen = { open: StepKey; isComplete: boolean; round: number };

/**
 * Which step is open. A tap that completes the open step moves on to the next one (typing never
 * does: the keyboard would jump away under the driver's thumb); a send that comes back with
 * messages opens the first step holding one; a restored draft opens at its first unanswered step.
 * Worked out while rendering, from what the last render saw (React's "previous render" pattern).
 */
export function useSteps(
  steps: StepKey[],
  draft: Draft | null,
  ctx: StepContext,
  errors: Record<string, string[]>,
  errorRound: number,
) {
  const [chosen, setChosen] = useState<StepKey | null>(null);
  const [lastInput, setLastInput] = useState<'tap' | 'type'>('type');
  const [seen, setSeen] = useState<Seen | null>(null);

  let open: StepKey = chosen ?? steps[0];
  if (draft) {
    const current = chosen ?? steps.find((s) => !isStepComplete(s, draft, ctx)) ?? steps[steps.length - 1];
    let next = current;
    if (seen && errorRound !== seen.round) next = firstStepWithError(steps, errors, ctx) ?? current;
    else if (
      seen?.open === current &&
      !seen.isComplete &&
      lastInput === 'tap' &&
      isStepComplete(current, draft, ctx)
    ) {
      next = nextStep(steps, current);
    }
    const now: Seen = { open: next, isComplete: isStepComplete(next, draft, ctx), round: errorRound };
    if (!seen || seen.open !== now.open || seen.isComplete !== now.isComplete || seen.round !== now.round) {
      setSeen(now);
    }
    if (chosen !== next) setChosen(next);
    open = next;
  }

  return {
    open,
    setOpen: setChosen,
    /** Spread on the form: taps and typing are told apart for the move to the next step. */
    inputHandlers: {
      onClickCapture: () => setLastInput('tap'),
      onChangeCapture: () => setLastInput('type'),
    },
  };
}
