import { after } from 'next/server';
import { CAUTIONS } from '@/app/_components/caution';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { refuse, type Refusal } from '@/lib/result';
import { route } from '@/lib/server/api';
import { submitHandoff } from '@/lib/server/handoffs/submit';
import { deliverDueEmails } from '@/lib/server/mail';
import { handoffSubmitSchema } from '@/lib/validation/handoffs';

type RefusedHold = { severity: string; restriction: string | null };

/** A refused hook names its holds (each with its caution); the driver also reads the cautions that fit them. */
function withCautions(r: Refusal): Refusal {
  const holds = r.detail?.holds as RefusedHold[] | undefined;
  if (!Array.isArray(holds) || !holds.length) return r;
  const has = (test: (h: RefusedHold) => boolean) => holds.some(test);
  const cautions: string[] = [
    has((h) => h.severity === 'out_of_service') ? CAUTIONS.outOfService : null,
    has((h) => h.restriction === 'yard_only') ? CAUTIONS.yardOnly : null,
    has((h) => h.restriction === 'no_perishable') ? CAUTIONS.noPerishable : null,
    CAUTIONS.inspection,
  ].flatMap((c) => (c === null ? [] : [c]));
  return refuse(r.code, r.message, r.fieldErrors, { holds, cautions });
}

/** Records a drop or hook. 201 with the new handoff; 200 with the same one for a retried submit. */
export const POST = route(
  { access: SECTION_ROLES.gate, body: handoffSubmitSchema },
  async ({ user, body }) => {
    const result = await submitHandoff(body, user);
    if (!result.ok) return withCautions(result);
    const { handoffId, verificationCode, isReplay } = result.value;
    // the receipt e-mail was queued in the transaction; send it now rather than at the worker's next round
    if (!isReplay) after(() => deliverDueEmails().catch(() => undefined));
    return Response.json(
      { handoff: { id: handoffId, verificationCode, receiptUrl: `/gate/receipts/${handoffId}` } },
      { status: isReplay ? 200 : 201 },
    );
  },
);
