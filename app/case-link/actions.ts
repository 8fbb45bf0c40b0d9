'use server';

import { revalidatePath } from 'next/cache';
import { z } from 'zod';
import { runCaseCommand } from '@/db/queries/case-commands';
import { verifyCaseLink } from '@/lib/desk/case-link';
import { deliverDueEmails } from '@/lib/server/mail';
import { appUrl, caseLinkSecret } from '@/lib/server/env';
import { linkDisputeSchema } from '@/lib/validation/desk';
import type { CaseActionState } from '../(app)/desk/actions';

/** A dispute sent from the e-mailed link: no account; the signed token names the case and the carrier. */
export async function disputeByLinkAction(
  _prev: CaseActionState,
  formData: FormData,
): Promise<CaseActionState> {
  const parsed = linkDisputeSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) {
    const flat = z.flattenError(parsed.error);
    return {
      ok: false,
      fieldErrors: flat.fieldErrors,
      formError: flat.formErrors[0] ?? 'Some fields need attention.',
    };
  }
  const link = verifyCaseLink(parsed.data.token, caseLinkSecret(), new Date());
  if (!link.ok)
    return {
      ok: false,
      formError:
        link.error === 'expired'
          ? 'This link has expired: the dispute window is over.'
          : 'This link is not valid.',
    };
  const result = await runCaseCommand({
    caseId: link.claims.caseId,
    command: { kind: 'dispute', note: `Via the e-mailed link: ${parsed.data.note}` },
    actor: { id: null, role: 'driver', carrierId: link.claims.carrierId },
    now: new Date(),
    appUrl: appUrl(),
    linkSecret: caseLinkSecret(),
  });
  if (!result.ok) return { ok: false, formError: result.reason };
  await deliverDueEmails().catch(() => undefined);
  revalidatePath(`/case-link/${parsed.data.token}`);
  return { ok: true, message: 'Your dispute is recorded. The terminal clerk will decide and e-mail you.' };
}
