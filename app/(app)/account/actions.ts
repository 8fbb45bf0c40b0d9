'use server';

import { headers } from 'next/headers';
import { getTranslations } from 'next-intl/server';
import { changeOwnSecret } from '@/lib/server/auth/account';
import { setOwnEmail } from '@/lib/server/auth/own-email';
import { formAction } from '@/lib/server/action';
import { clientAddress } from '@/lib/server/client-address';
import { changePasswordSchema, changePinSchema, ownEmailSchema } from '@/lib/validation/account';

/** A driver's own PIN: the current one, then the new one twice. Other phones are signed out. */
export const changePinAction = formAction(
  { roles: ['driver'], schema: changePinSchema },
  async (user, input) => {
    const result = await changeOwnSecret(
      user,
      { kind: 'pin', current: input.currentPin, next: input.newPin, currentField: 'currentPin' },
      clientAddress(await headers()),
    );
    if (!result.ok) return result;
    return { ok: true, message: (await getTranslations('Account'))('pinChanged') };
  },
);

/** A staff member's own password, likewise. */
export const changePasswordAction = formAction(
  { roles: ['jockey', 'clerk', 'admin'], schema: changePasswordSchema },
  async (user, input) => {
    const result = await changeOwnSecret(
      user,
      {
        kind: 'password',
        current: input.currentPassword,
        next: input.newPassword,
        currentField: 'currentPassword',
      },
      clientAddress(await headers()),
    );
    if (!result.ok) return result;
    return { ok: true, message: (await getTranslations('Account'))('passwordChanged') };
  },
);

/** A driver's own e-mail address for receipts (empty removes it). */
export const changeEmailAction = formAction(
  { roles: ['driver'], schema: ownEmailSchema },
  async (user, input) => {
    const result = await setOwnEmail(user, input);
    if (!result.ok) return result;
    const t = await getTranslations('Account');
    return { ok: true, message: result.value ? t('emailSaved', { email: result.value }) : t('emailRemoved') };
  },
);
