'use server';

import { revalidatePath } from 'next/cache';
import { getTranslations } from 'next-intl/server';
import { formAction } from '@/lib/server/action';
import { disputeByLink } from '@/lib/server/desk/link-dispute';
import { linkDisputeSchema } from '@/lib/validation/desk';

/** A dispute sent from the e-mailed link: no account; the signed token names the case and the carrier. */
export const disputeByLinkAction = formAction(
  { roles: 'public', schema: linkDisputeSchema },
  async (_user, v) => {
    const result = await disputeByLink({ token: v.token, note: v.note });
    if (!result.ok) return result;
    revalidatePath(`/case-link/${v.token}`);
    return { ok: true, message: (await getTranslations('CaseLink'))('done') };
  },
);
