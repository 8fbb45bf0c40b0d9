'use server';

import { revalidatePath } from 'next/cache';
import { z } from 'zod';
import { runCaseCommand } from '@/db/queries/case-commands';
import type { CaseCommand } from '@/lib/desk/case-state';
import { deliverDueEmails } from '@/lib/server/mail';
import { requireUser } from '@/lib/server/auth';
import { appUrl, caseLinkSecret } from '@/lib/server/env';
import {
  closeCaseSchema,
  decideCaseSchema,
  disputeCaseSchema,
  notifyCaseSchema,
  overrideEstimateSchema,
} from '@/lib/validation/desk';

export type CaseActionState = {
  ok: boolean;
  message?: string;
  formError?: string;
  fieldErrors?: Record<string, string[] | undefined>;
};

const STAFF = ['clerk', 'admin'] as const;

async function run(
  formData: FormData,
  roles: readonly ('driver' | 'clerk' | 'admin')[],
  schema: z.ZodType<{ caseId: string }>,
  toCommand: (v: never) => CaseCommand,
  done: string,
): Promise<CaseActionState> {
  const user = await requireUser(roles);
  const parsed = schema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) {
    const flat = z.flattenError(parsed.error);
    return {
      ok: false,
      fieldErrors: flat.fieldErrors as Record<string, string[]>,
      formError: flat.formErrors[0] ?? 'Some fields need attention.',
    };
  }
  const result = await runCaseCommand({
    caseId: parsed.data.caseId,
    command: toCommand(parsed.data as never),
    actor: { id: user.id, role: user.role, carrierId: user.carrierId },
    now: new Date(),
    appUrl: appUrl(),
    linkSecret: caseLinkSecret(),
  });
  if (!result.ok) return { ok: false, formError: result.reason };
  // the outbox worker retries anyway; this sends the e-mail at once when the mail server is up
  await deliverDueEmails().catch(() => undefined);
  revalidatePath(`/desk/cases/${parsed.data.caseId}`);
  revalidatePath('/desk');
  return { ok: true, message: done };
}

export async function notifyCaseAction(_prev: CaseActionState, formData: FormData) {
  return run(
    formData,
    STAFF,
    notifyCaseSchema,
    () => ({ kind: 'notify' }),
    'The carrier is notified; the e-mail is on its way.',
  );
}

export async function disputeCaseAction(_prev: CaseActionState, formData: FormData) {
  return run(
    formData,
    ['driver', 'clerk', 'admin'],
    disputeCaseSchema,
    (v: z.infer<typeof disputeCaseSchema>) => ({ kind: 'dispute', note: v.note, photoIds: v.photoIds }),
    'Your dispute is recorded. The terminal clerk will decide.',
  );
}

export async function decideCaseAction(_prev: CaseActionState, formData: FormData) {
  return run(
    formData,
    STAFF,
    decideCaseSchema,
    (v: z.infer<typeof decideCaseSchema>) => ({
      kind: 'decide',
      decision: v.decision,
      chargedCents: v.chargedCents,
      reason: v.reason,
    }),
    'Decided; the carrier is e-mailed.',
  );
}

export async function overrideEstimateAction(_prev: CaseActionState, formData: FormData) {
  return run(
    formData,
    STAFF,
    overrideEstimateSchema,
    (v: z.infer<typeof overrideEstimateSchema>) => ({
      kind: 'override',
      overrideCents: v.amount,
      reason: v.reason,
    }),
    'Estimate changed.',
  );
}

export async function closeCaseAction(_prev: CaseActionState, formData: FormData) {
  return run(
    formData,
    STAFF,
    closeCaseSchema,
    (v: z.infer<typeof closeCaseSchema>) => ({ kind: 'close', note: v.note }),
    'Case closed.',
  );
}
