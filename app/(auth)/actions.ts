'use server';

import bcrypt from 'bcryptjs';
import { redirect } from 'next/navigation';
import { z } from 'zod';
import { recordAudit } from '@/db/queries/audit';
import {
  clearFailedSignIns,
  getUserForDriverSignIn,
  getUserForStaffSignIn,
  recordFailedSignIn,
} from '@/db/queries/users';
import { homeFor } from '@/lib/auth/roles';
import { getSession } from '@/lib/server/session';
import { lockAfterFailure, secondsLocked } from '@/lib/sign-in-throttle';
import { safeNext, signInSchema } from '@/lib/validation/auth';

export type SignInState = {
  ok: boolean;
  method: 'driver' | 'staff';
  formError?: string;
  fieldErrors?: Record<string, string[] | undefined>;
  values?: { email?: string; driverNumber?: string };
};

// Compared against when the account does not exist, so a wrong name costs the same time as a wrong secret.
const DUMMY_HASH = '$2b$10$CwTycUXWue0Thq9StjUM0uJ8.cSJcB6ZxLDIzl3nHZ9zA1l6pTzHO';
const FAILURE_DELAY_MS = 400;

export async function signInAction(_prev: SignInState, formData: FormData): Promise<SignInState> {
  const raw = Object.fromEntries(formData);
  const method = raw.method === 'staff' ? 'staff' : 'driver';
  const values = { email: String(raw.email ?? ''), driverNumber: String(raw.driverNumber ?? '') };
  const parsed = signInSchema.safeParse(raw);
  if (!parsed.success) {
    const flat = z.flattenError(parsed.error);
    return { ok: false, method, fieldErrors: flat.fieldErrors, formError: flat.formErrors[0], values };
  }
  const input = parsed.data;
  const user =
    input.method === 'staff'
      ? await getUserForStaffSignIn(input.email)
      : await getUserForDriverSignIn(input.driverNumber);
  const secret = input.method === 'staff' ? input.password : input.pin;
  const wrong =
    input.method === 'staff'
      ? 'That e-mail and password do not match.'
      : 'That driver number and PIN do not match.';

  const now = new Date();
  const lockedFor = user ? secondsLocked(user.lockedUntil, now) : 0;
  if (lockedFor > 0) {
    return {
      ok: false,
      method,
      formError: `Too many failed attempts. Try again in ${lockedFor} seconds.`,
      values,
    };
  }
  const matches = await bcrypt.compare(secret, user?.secretHash ?? DUMMY_HASH);
  if (!user || !matches || !user.isActive) {
    if (user) await recordFailedSignIn(user.id, (count) => lockAfterFailure(count, now));
    await new Promise((r) => setTimeout(r, FAILURE_DELAY_MS));
    return { ok: false, method, formError: wrong, values };
  }

  await clearFailedSignIns(user.id);
  const session = await getSession();
  session.userId = user.id;
  session.role = user.role;
  session.carrierId = user.carrierId;
  session.terminalId = user.homeTerminalId;
  await session.save();
  await recordAudit({ actorId: user.id, action: 'sign_in', entityType: 'user', entityId: user.id });
  redirect(safeNext(input.next) ?? homeFor(user.role));
}

export async function signOutAction() {
  const session = await getSession();
  session.destroy();
  redirect('/login');
}
