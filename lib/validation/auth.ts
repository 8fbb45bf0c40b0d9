import { z } from 'zod';
import { hasControl } from './text';

/** Staff sign in with e-mail and password. */
export const staffSignInSchema = z.object({
  method: z.literal('staff'),
  email: z.email({ error: 'Enter your e-mail address, like name@example.com.' }).trim().toLowerCase(),
  password: z
    .string()
    .min(1, { error: 'Enter your password.' })
    .max(200)
    .refine((s) => !hasControl(s), { error: 'Remove the special characters from this field.' }),
  next: z.string().max(500).optional(),
});

/** Drivers sign in with their driver number and a 4–8 digit PIN. */
export const driverSignInSchema = z.object({
  method: z.literal('driver'),
  driverNumber: z
    .string()
    .trim()
    .toUpperCase()
    .regex(/^[A-Z0-9-]{3,20}$/, { error: 'Enter your driver number (letters, digits, dashes).' }),
  pin: z.string().regex(/^\d{4,8}$/, { error: 'Your PIN is 4 to 8 digits.' }),
  next: z.string().max(500).optional(),
});

export const signInSchema = z.discriminatedUnion('method', [staffSignInSchema, driverSignInSchema], {
  error: 'Choose how to sign in.',
});
export type SignInInput = z.infer<typeof signInSchema>;

/** Only same-site paths are followed after sign-in. */
export function safeNext(next: string | undefined): string | null {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return null;
  // a control character in a redirect target is never a page of ours (and breaks the Location header)
  if (/[\u0000-\u001f\u007f]/.test(next)) return null;
  return next;
}
