'use client';

import { useEffect, type RefObject } from 'react';

/**
 * After a refused send, moves focus and the view to the first field with a message, in the order
 * the form shows them: an input marked aria-invalid, or a marked group (its first button).
 * `round` changes on every send, so the same errors twice still move the driver there.
 */
export function useFocusFirstError(form: RefObject<HTMLFormElement | null>, round: number, ready: boolean) {
  useEffect(() => {
    if (!round || !ready || !form.current) return;
    const first = form.current.querySelector<HTMLElement>('[aria-invalid="true"], [data-invalid="true"]');
    if (!first) return;
    const target =
      first.dataset.invalid === 'true'
        ? (first.querySelector<HTMLElement>('button, input, textarea, select') ?? first)
        : first;
    first.scrollIntoView({ block: 'center' });
    target.focus({ preventScroll: true });
  }, [form, round, ready]);
}
