'use server';

import { revalidatePath } from 'next/cache';
import { redirect } from 'next/navigation';
import enTrailers from '@/lib/i18n/messages/en/Trailers.json';
import { formAction } from '@/lib/server/action';
import { reissueLabel } from '@/lib/server/labels';
import { reissueLabelSchema } from '@/lib/validation/labels';

/** Clerks and admins re-issue a label: the old one stops working at once (audit-logged by the service). */
export const reissueLabelAction = formAction(
  {
    roles: ['clerk', 'admin'],
    schema: reissueLabelSchema,
    invalidMessage: enTrailers.labels.unreadable,
  },
  async (user, input) => {
    const result = await reissueLabel(user, input);
    if (!result.ok) return result;
    revalidatePath(`/trailers/${input.trailerId}/label`);
    redirect(`/trailers/${input.trailerId}/label?reissued=1`);
  },
);
