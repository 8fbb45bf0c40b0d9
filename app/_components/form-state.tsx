'use client';

import { createContext, useContext } from 'react';
import type { ActionState } from '@/lib/result';

// The state of the enclosing ActionForm, so each field finds its own message and typed value.
const FormStateContext = createContext<ActionState | null>(null);

export const FormStateProvider = FormStateContext.Provider;

/** The first message for `name` from the enclosing form's last answer, if any. */
export function useFieldError(name: string, explicit?: string[]): string[] | undefined {
  const state = useContext(FormStateContext);
  return explicit ?? state?.fieldErrors?.[name];
}

/** The value typed into `name` before a refused submit, to refill the field. */
export function useTypedValue(name: string): string | undefined {
  return useContext(FormStateContext)?.values?.[name];
}
