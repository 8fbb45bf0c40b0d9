'use server';

import { headers } from 'next/headers';
import { redirect } from 'next/navigation';
import type { ActionState } from '@/lib/result';
import { signIn } from '@/lib/server/auth/sign-in';
import { clientAddress } from '@/lib/server/client-address';
import { signInSchema } from '@/lib/validation/auth';
import { describeZodError } from '@/lib/validation/errors';

// Refilled after a refusal; the PIN and the password never go back to the browser.
const ECHOED = ['method', 'email', 'driverNumber'] as const;

/** Sign-in has no signed-in user yet, so it parses for itself instead of going through formAction. */
export async function signInAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const raw = Object.fromEntries(form);
  const values = Object.fromEntries(ECHOED.map((k) => [k, String(raw[k] ?? '')]));
  const parsed = signInSchema.safeParse(raw);
  if (!parsed.success) {
    const { message, fieldErrors } = describeZodError(parsed.error);
    // messages stand under their fields; the method is a hidden field, so its message is the summary
    const formError = fieldErrors.method?.[0] ?? (Object.keys(fieldErrors).length ? undefined : message);
    return { ok: false, formError, fieldErrors, values };
  }
  const result = await signIn(parsed.data, new Date(), clientAddress(await headers()));
  if (!result.ok) return { ok: false, formError: result.message, fieldErrors: result.fieldErrors, values };
  redirect(result.value.next);
}
