import 'server-only';
import { verifyCaseLink } from '@/lib/desk/case-link';
import { refuse, type Result } from '@/lib/result';
import { caseLinkSecret } from '../env';
import { runCaseCommand, type CaseCommandDone } from './case-command';

/**
 * A dispute sent from the e-mailed link, without an account: the signed token names the case and
 * the carrier, and the dispute runs as that carrier (no person id).
 */
export async function disputeByLink(
  input: { token: string; note: string },
  now = new Date(),
): Promise<Result<CaseCommandDone>> {
  const link = verifyCaseLink(input.token, caseLinkSecret(), now);
  if (!link.ok) {
    return link.error === 'expired'
      ? refuse('gone', 'This link has expired: the dispute window is over.')
      : refuse('forbidden', 'This link is not valid.');
  }
  return runCaseCommand(
    { id: null, role: 'driver', carrierId: link.claims.carrierId },
    {
      caseId: link.claims.caseId,
      command: { kind: 'dispute', note: `Via the e-mailed link: ${input.note}` },
    },
    { now },
  );
}
