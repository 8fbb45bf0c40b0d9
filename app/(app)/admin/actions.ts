'use server';

import { revalidatePath } from 'next/cache';
import { getTranslations } from 'next-intl/server';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { changeUserAccess } from '@/lib/server/auth/account';
import { formAction } from '@/lib/server/action';
import { userAccessSchema } from '@/lib/validation/account';

/** An admin changes a person's role or switches their account off; that person's sessions end. */
export const changeUserAccessAction = formAction(
  { roles: SECTION_ROLES.admin, schema: userAccessSchema },
  async (admin, input) => {
    const result = await changeUserAccess(admin, input);
    if (!result.ok) return result;
    revalidatePath('/admin');
    return { ok: true, message: (await getTranslations('Account'))('accessChanged') };
  },
);
