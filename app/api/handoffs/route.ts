import { CAUTIONS } from '@/app/_components/caution';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { refuse, type Refusal } from '@/lib/result';
import { route } from '@/lib/server/api';
import { submitHandoff } from '@/lib/server/handoffs/submit';
import { handoffSubmitSchema } from '@/lib/validation/handoffs';

/** A refused hook names its holds; the driver also reads the out-of-service and inspection cautions. */
function withCautions(r: Refusal): Refusal {
  const holds = r.detail?.holds;
  if (!Array.isArray(holds) || !holds.length) return r;
  return refuse(r.code, r.message, r.fieldErrors, {
    holds,
    cautions: [CAUTIONS.outOfService, CAUTIONS.inspection],
  });
}

/** Records a drop or hook. 201 with the new handoff; 200 with the same one for a retried submit. */
export const POST = route(
  { access: SECTION_ROLES.gate, body: handoffSubmitSchema },
  async ({ user, body }) => {
    const result = await submitHandoff(body, user);
    if (!result.ok) return withCautions(result);
    const { handoffId, verificationCode, isReplay } = result.value;
    // the receipt e-mail and its sending job were queued in the transaction; the job worker sends it
    return Response.json(
      { handoff: { id: handoffId, verificationCode, receiptUrl: `/gate/receipts/${handoffId}` } },
      { status: isReplay ? 200 : 201 },
    );
  },
);
