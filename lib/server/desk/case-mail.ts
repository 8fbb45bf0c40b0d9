import 'server-only';
import type { Tx } from '@/db';
import { listFindingsOfCase, type LockedCase } from '@/db/queries/case-changes';
import { enqueueEmail } from '@/db/queries/outbox';
import { caseEmailFacts, decisionEmail, notifyEmail } from '@/lib/desk/case-email';
import { signCaseLink } from '@/lib/desk/case-link';
import type { CaseCommand } from '@/lib/desk/case-state';
import { appUrl, caseLinkSecret } from '../env';

/**
 * Writes the e-mail a command sends to the proposed carrier into the outbox, in the command's own
 * transaction (delivered after commit): the notice with a signed dispute link, or the decision,
 * in the carrier contact's language (carriers.locale).
 */
export async function queueCaseEmail(
  tx: Tx,
  row: LockedCase,
  command: CaseCommand,
  amountCents: number,
  disputeDeadline: Date | undefined,
) {
  const c = row.c;
  if (!row.carrierEmail) return;
  const facts = async () =>
    caseEmailFacts(row, await listFindingsOfCase(tx, c.id), amountCents, row.carrierLocale);
  let mail: { subject: string; text: string } | null = null;
  if (command.kind === 'notify' && c.proposedCarrierId && disputeDeadline) {
    const token = signCaseLink(
      { caseId: c.id, carrierId: c.proposedCarrierId, expiresAt: disputeDeadline },
      caseLinkSecret(),
    );
    mail = notifyEmail(await facts(), disputeDeadline, `${appUrl()}/case-link/${token}`);
  }
  if (command.kind === 'decide') {
    mail = decisionEmail(await facts(), command.decision, command.chargedCents, command.reason.trim());
  }
  if (mail) await enqueueEmail({ to: row.carrierEmail, ...mail, relatedType: 'case', relatedId: c.id }, tx);
}
