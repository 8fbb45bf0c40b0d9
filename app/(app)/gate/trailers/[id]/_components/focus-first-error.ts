'use client';

import { useEffect, useRef, type RefObject } from 'react';

/**
 * After a refused send, moves focus and the view to the first field with a message, in the order
 * the form shows them: an input marked aria-invalid, or a marked group (its first button).
 * `round` changes on every send that came back with messages; `isReady` turns true once the step
 * holding the first message is the one shown.
 */
export function useFocusFirstError(form: RefObject<HTMLFormElement | null>, round: number, isReady: boolean) {
  const done = useRef(0);
  useEffect(() => {
    if (!round || !isReady || done.current === round || !form.current) return;
    const first = form.current.querySelector<HTMLElement>('[aria-invalid="true"], [data-invalid="true"]');
    if (!first) return;
    done.current = round;
    const target =
      first.dataset.invalid === 'true'
        ? (first.querySelector<HTMLElement>('button, input, textarea, select') ?? first)
        : first;
    first.scrollIntoView({ block: 'center' });
    target.focus({ preventScroll: true });
  }, [form, round, isReady]);
}
