// A signed-in person changing their own PIN or password, and an admin changing someone's role or
// switching their account off. The secrets follow the sign-in rules (lib/validation/auth.ts).
import { z } from 'zod';
import { driverSignInSchema, staffSignInSchema } from './auth';

const pin = driverSignInSchema.shape.pin;
const password = staffSignInSchema.shape.password;

/**
 * A new password's least length: NIST SP 800-63B (rev. 3) §5.1.1.1 asks for at least 8 characters
 * for a secret the person chooses, and no other composition rules.
 */
export const NEW_PASSWORD_MIN = 8;

export const changePinSchema = z
  .object({ currentPin: pin, newPin: pin, repeatPin: z.string().max(20) })
  .refine((v) => v.newPin === v.repeatPin, {
    path: ['repeatPin'],
    error: 'The two new PINs are not the same.',
  })
  .refine((v) => v.newPin !== v.currentPin, {
    path: ['newPin'],
    error: 'Choose a PIN other than the one you have now.',
  });
export type ChangePinInput = z.infer<typeof changePinSchema>;

export const changePasswordSchema = z
  .object({
    currentPassword: password,
    newPassword: password.refine((s) => s.length >= NEW_PASSWORD_MIN, {
      error: `A new password is at least ${NEW_PASSWORD_MIN} characters.`,
    }),
    repeatPassword: z.string().max(200),
  })
  .refine((v) => v.newPassword === v.repeatPassword, {
    path: ['repeatPassword'],
    error: 'The two new passwords are not the same.',
  })
  .refine((v) => v.newPassword !== v.currentPassword, {
    path: ['newPassword'],
    error: 'Choose a password other than the one you have now.',
  });
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;

/** Staff roles an admin may give; a driver account stays a driver (it signs in with a number and PIN). */
export const STAFF_ROLES = ['jockey', 'clerk', 'admin'] as const;

export const userAccessSchema = z.object({
  userId: z.uuid({ error: 'Choose a person from the list.' }),
  role: z.enum(['driver', ...STAFF_ROLES], { error: 'Choose a role.' }),
  // a checkbox: present ("on") when ticked, absent when not
  isActive: z
    .literal('on')
    .optional()
    .transform((v) => v === 'on'),
});
export type UserAccessInput = z.infer<typeof userAccessSchema>;

/** The longest address SMTP can carry: RFC 5321 §4.5.3.1 (a 256-octet path less its two brackets). */
export const EMAIL_MAX = 254;

/** A driver's own e-mail address for receipts; empty removes it. */
export const ownEmailSchema = z.object({
  email: z
    .string()
    .trim()
    .max(EMAIL_MAX, { error: `An e-mail address is at most ${EMAIL_MAX} characters.` })
    .pipe(
      z.union([
        z.literal(''),
        z.email({ error: 'Type the whole address, like name@example.com, or leave it empty.' }),
      ]),
    )
    .transform((v) => (v === '' ? null : v.toLowerCase())),
});
export type OwnEmailInput = z.infer<typeof ownEmailSchema>;
