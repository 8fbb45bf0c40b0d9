import { after } from 'next/server';
import { CAUTIONS } from '@/app/_components/caution';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { HandoffError } from '@/lib/handoff-errors';
import { refuse } from '@/lib/result';
import { route } from '@/lib/server/api';
import { submitHandoff } from '@/lib/server/handoffs';
import { deliverDueEmails } from '@/lib/server/mail';
import { handoffSubmitSchema } from '@/lib/validation/handoffs';

/** Records a drop or hook. 201 with the new handoff; 200 with the same one for a retried submit. */
export const POST = route(
  { access: SECTION_ROLES.gate, body: handoffSubmitSchema },
  async ({ user, body }) => {
    try {
      const result = await submitHandoff(body, {
        id: user.id,
        role: user.role,
        carrierId: user.carrierId,
        terminalId: user.terminalId,
      });
      // the receipt e-mail was queued in the transaction; send it now rather than at the worker's next round
      if (!result.isReplay) after(() => deliverDueEmails().catch(() => undefined));
      return Response.json(
        {
          handoff: {
            id: result.handoffId,
            verificationCode: result.verificationCode,
            receiptUrl: `/gate/receipts/${result.handoffId}`,
          },
        },
        { status: result.isReplay ? 200 : 201 },
      );
    } catch (error) {
      if (!(error instanceof HandoffError)) throw error;
      const detail = error.holds?.length
        ? {
            holds: error.holds.map((h) => ({ reason: h.reason, severity: h.severity })),
            cautions: [CAUTIONS.outOfService, CAUTIONS.inspection],
          }
        : undefined;
      return refuse(error.holds?.length ? 'conflict' : error.code, error.message, error.fieldErrors, detail);
    }
  },
);
