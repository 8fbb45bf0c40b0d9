import { after } from 'next/server';
import { SECTION_ROLES } from '@/lib/roles';
import { HandoffError } from '@/lib/handoff-errors';
import { invalid, readJson } from '@/lib/server/api';
import { apiUser } from '@/lib/server/auth';
import { handoffErrorResponse } from '@/lib/server/handoff-response';
import { submitHandoff } from '@/lib/server/handoffs';
import { deliverDueEmails } from '@/lib/server/mail';
import { handoffSubmitSchema } from '@/lib/validation/handoffs';

/** Records a drop or hook. 201 with the new handoff; 200 with the same one for a retried submit. */
export async function POST(request: Request) {
  const user = await apiUser(SECTION_ROLES.gate);
  if (user instanceof Response) return user;
  const body = await readJson(request);
  if (!body.ok) return body.response;
  const parsed = handoffSubmitSchema.safeParse(body.body);
  if (!parsed.success) return invalid(parsed.error);
  try {
    const result = await submitHandoff(parsed.data, {
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
    if (error instanceof HandoffError) return handoffErrorResponse(error);
    throw error;
  }
}
