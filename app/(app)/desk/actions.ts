'use server';

import { revalidatePath } from 'next/cache';
import { getTranslations } from 'next-intl/server';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { DESK_STAFF } from '@/lib/desk/access';
import type { CaseCommand } from '@/lib/desk/case-state';
import { formAction } from '@/lib/server/action';
import type { SessionUser } from '@/lib/server/auth';
import { runCaseCommand } from '@/lib/server/desk/case-command';
import { resendEmail } from '@/lib/server/jobs/mail-failures';
import {
  closeCaseSchema,
  decideCaseSchema,
  disputeCaseSchema,
  notifyCaseSchema,
  overrideEstimateSchema,
  resendEmailSchema,
} from '@/lib/validation/desk';

type Done = 'notified' | 'disputed' | 'decided' | 'override' | 'closed';

async function command(user: SessionUser, caseId: string, cmd: CaseCommand, done: Done) {
  const result = await runCaseCommand(
    { id: user.id, role: user.role, carrierId: user.carrierId },
    { caseId, command: cmd },
  );
  if (!result.ok) return result;
  // the e-mail and its sending job were queued with the case change; the job worker sends it
  revalidatePath(`/desk/cases/${caseId}`);
  revalidatePath('/desk');
  return { ok: true as const, message: (await getTranslations('Case'))(`done.${done}`) };
}

export const notifyCaseAction = formAction({ roles: DESK_STAFF, schema: notifyCaseSchema }, (user, v) =>
  command(user, v.caseId, { kind: 'notify' }, 'notified'),
);

// drivers dispute their own carrier's cases; the service finds no other
export const disputeCaseAction = formAction(
  { roles: SECTION_ROLES.desk, schema: disputeCaseSchema },
  (user, v) => command(user, v.caseId, { kind: 'dispute', note: v.note, photoIds: v.photoIds }, 'disputed'),
);

export const decideCaseAction = formAction({ roles: DESK_STAFF, schema: decideCaseSchema }, (user, v) =>
  command(
    user,
    v.caseId,
    { kind: 'decide', decision: v.decision, chargedCents: v.chargedCents, reason: v.reason },
    'decided',
  ),
);

export const overrideEstimateAction = formAction(
  { roles: DESK_STAFF, schema: overrideEstimateSchema },
  (user, v) =>
    command(user, v.caseId, { kind: 'override', overrideCents: v.amount, reason: v.reason }, 'override'),
);

export const closeCaseAction = formAction({ roles: DESK_STAFF, schema: closeCaseSchema }, (user, v) =>
  command(user, v.caseId, { kind: 'close', note: v.note }, 'closed'),
);

/** Queues a failed e-mail again (clerks and admins). */
export const resendEmailAction = formAction(
  { roles: DESK_STAFF, schema: resendEmailSchema },
  async (_user, v) => {
    const result = await resendEmail(v);
    if (!result.ok) return result;
    revalidatePath('/desk');
    return { ok: true, message: (await getTranslations('Desk'))('mail.queued') };
  },
);
