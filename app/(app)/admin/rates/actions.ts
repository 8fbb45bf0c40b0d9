'use server';

import { revalidatePath } from 'next/cache';
import { getTranslations } from 'next-intl/server';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { formAction } from '@/lib/server/action';
import { addRate, changeRate } from '@/lib/server/desk/rates';
import { addRateSchema, changeRateSchema } from '@/lib/validation/desk';

export const addRateAction = formAction(
  { roles: SECTION_ROLES.admin, schema: addRateSchema },
  async (user, v) => {
    const result = await addRate(user, v);
    if (!result.ok) return result;
    revalidatePath('/admin/rates');
    return {
      ok: true,
      message: (await getTranslations('Admin'))('rates.added', {
        pattern: v.itemPattern,
        condition: v.condition,
      }),
    };
  },
);

export const changeRateAction = formAction(
  { roles: SECTION_ROLES.admin, schema: changeRateSchema },
  async (user, v) => {
    const result = await changeRate(user, v);
    if (!result.ok) return result;
    revalidatePath('/admin/rates');
    return { ok: true, message: (await getTranslations('Admin'))('rates.saved') };
  },
);
