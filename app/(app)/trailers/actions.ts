'use server';

import { TZDate } from '@date-fns/tz';
import { revalidatePath } from 'next/cache';
import { z } from 'zod';
import { releaseHold } from '@/db/queries/holds';
import { requireUser } from '@/lib/server/auth';
import { releaseHoldSchema } from '@/lib/validation/desk';

export type ReleaseState = {
  ok: boolean;
  message?: string;
  formError?: string;
  fieldErrors?: Record<string, string[] | undefined>;
};

const REFUSALS = {
  not_found: 'This hold does not exist on this trailer.',
  already_released: 'This hold was already released.',
  repair_in_future: 'The repair time is in the future.',
  repair_before_hold: 'The repair time is before the hold was placed.',
} as const;

/** Clerks release a hold by recording the repair: who repaired it, what was done, and when. */
export async function releaseHoldAction(_prev: ReleaseState, formData: FormData): Promise<ReleaseState> {
  const user = await requireUser(['clerk', 'admin']);
  const parsed = releaseHoldSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) {
    const flat = z.flattenError(parsed.error);
    return {
      ok: false,
      fieldErrors: flat.fieldErrors,
      formError: flat.formErrors[0] ?? 'Some fields need attention.',
    };
  }
  const v = parsed.data;
  // the form's local date and time are the terminal's wall clock
  const [d, t] = v.repairedAt.split('T');
  const [y, mo, da] = d.split('-').map(Number);
  const [h, mi] = t.split(':').map(Number);
  const repairedAt = new Date(new TZDate(y, mo - 1, da, h, mi, user.terminalTimeZone ?? 'UTC').getTime());
  const result = await releaseHold({
    holdId: v.holdId,
    trailerId: v.trailerId,
    repairedBy: v.repairedBy,
    repairNote: v.repairNote,
    repairedAt,
    releasedById: user.id,
  });
  if (!result.ok) return { ok: false, formError: REFUSALS[result.error] };
  revalidatePath(`/trailers/${v.trailerId}`);
  return { ok: true, message: 'Hold released. The repair is on the trailer file.' };
}
