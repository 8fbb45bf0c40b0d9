import { getTranslations } from 'next-intl/server';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { refuse, type Refusal } from '@/lib/result';
import { route } from '@/lib/server/api';
import { submitHandoff } from '@/lib/server/handoffs/submit';
import { handoffSubmitSchema } from '@/lib/validation/handoffs';

type RefusedHold = { severity: string; restriction: string | null };

/**
 * A refused hook names its holds (each with its caution); the driver also reads the cautions that
 * fit them, in the reader's language (English for a client that has not chosen one).
 */
async function withCautions(r: Refusal): Promise<Refusal> {
  const holds = r.detail?.holds as RefusedHold[] | undefined;
  if (!Array.isArray(holds) || !holds.length) return r;
  const has = (test: (h: RefusedHold) => boolean) => holds.some(test);
  const c = await getTranslations('Cautions');
  const cautions: string[] = [
    has((h) => h.severity === 'out_of_service') ? c('outOfService') : null,
    has((h) => h.restriction === 'yard_only') ? c('yardOnly') : null,
    has((h) => h.restriction === 'no_perishable') ? c('noPerishable') : null,
    c('inspection'),
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
    // the receipt e-mail and its sending job were queued in the transaction; the job worker sends it
    return Response.json(
      { handoff: { id: handoffId, verificationCode, receiptUrl: `/gate/receipts/${handoffId}` } },
      { status: isReplay ? 200 : 201 },
    );
  },
);
