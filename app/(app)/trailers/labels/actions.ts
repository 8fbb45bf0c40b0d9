'use server';

import { notFound, redirect } from 'next/navigation';
import { revalidatePath } from 'next/cache';
import { reissueLabel } from '@/db/queries/labels';
import { requireUser } from '@/lib/server/auth';
import { reissueLabelSchema } from '@/lib/validation/labels';

export type ReissueState = { ok: false; formError: string } | null;

/** Clerks and admins re-issue a label: the old one stops working at once (audit-logged in the query). */
export async function reissueLabelAction(_prev: ReissueState, formData: FormData): Promise<ReissueState> {
  const user = await requireUser(['clerk', 'admin']);
  const parsed = reissueLabelSchema.safeParse({ trailerId: formData.get('trailerId') });
  if (!parsed.success)
    return { ok: false, formError: 'That trailer could not be read. Reload the page and try again.' };
  const result = await reissueLabel(parsed.data.trailerId, user.id);
  if (!result) notFound();
  revalidatePath(`/trailers/${parsed.data.trailerId}/label`);
  redirect(`/trailers/${parsed.data.trailerId}/label?reissued=1`);
}
