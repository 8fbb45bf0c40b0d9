'use server';

import { revalidatePath } from 'next/cache';
import { getTranslations } from 'next-intl/server';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { formAction } from '@/lib/server/action';
import { clearTask } from '@/lib/server/yard/tasks';
import { clearTaskSchema } from '@/lib/validation/yard';

export const clearTaskAction = formAction(
  { roles: SECTION_ROLES.yard, schema: clearTaskSchema },
  async (user, input) => {
    const cleared = await clearTask(user, input);
    if (!cleared.ok) return cleared;
    revalidatePath('/yard/tasks');
    return { ok: true, message: (await getTranslations('Yard'))('tasks.cleared') };
  },
);
