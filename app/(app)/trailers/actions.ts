'use server';

import { revalidatePath } from 'next/cache';
import { getTranslations } from 'next-intl/server';
import { DESK_STAFF } from '@/lib/desk/access';
import { fromLocalInput } from '@/lib/format/time';
import { refuseField } from '@/lib/result';
import { formAction } from '@/lib/server/action';
import { releaseHold } from '@/lib/server/holds/release';
import { releaseHoldSchema } from '@/lib/validation/desk';

/** Clerks release a hold by recording the repair: who repaired it, what was done, and when. */
export const releaseHoldAction = formAction(
  { roles: DESK_STAFF, schema: releaseHoldSchema },
  async (user, v) => {
    // the form's local date and time are the terminal's wall clock
    const t = await getTranslations('Trailers');
    const repairedAt = fromLocalInput(v.repairedAt, user.terminalTimeZone ?? 'UTC');
    if (!repairedAt) return refuseField('invalid', 'repairedAt', t('release.badTime'));
    const result = await releaseHold(user, { ...v, repairedAt });
    if (!result.ok) return result;
    revalidatePath(`/trailers/${v.trailerId}`);
    return { ok: true, message: t('release.done') };
  },
);
