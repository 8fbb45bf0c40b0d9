'use server';

import { revalidatePath } from 'next/cache';
import { z } from 'zod';
import { recordAudit } from '@/db/queries/audit';
import { addRate, changeRate } from '@/db/queries/rates';
import { requireUser } from '@/lib/server/auth';
import { addRateSchema, changeRateSchema } from '@/lib/validation/desk';

export type RateState = {
  ok: boolean;
  message?: string;
  formError?: string;
  fieldErrors?: Record<string, string[] | undefined>;
};

const failed = (error: z.ZodError): RateState => {
  const flat = z.flattenError(error);
  return {
    ok: false,
    fieldErrors: flat.fieldErrors,
    formError: flat.formErrors[0] ?? 'Some fields need attention.',
  };
};

export async function addRateAction(_prev: RateState, formData: FormData): Promise<RateState> {
  const user = await requireUser(['admin']);
  const parsed = addRateSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return failed(parsed.error);
  const { itemPattern, condition, amount } = parsed.data;
  if (!(await addRate({ itemPattern, condition, amountCents: amount }))) {
    return {
      ok: false,
      fieldErrors: {
        itemPattern: [`${itemPattern} already has a ${condition} rate; change it in the list.`],
      },
    };
  }
  await recordAudit({
    actorId: user.id,
    action: 'rate_added',
    entityType: 'rate_card',
    entityId: itemPattern,
    detail: { condition, amountCents: amount },
  });
  revalidatePath('/admin/rates');
  return { ok: true, message: `Added ${itemPattern} (${condition}).` };
}

export async function changeRateAction(_prev: RateState, formData: FormData): Promise<RateState> {
  const user = await requireUser(['admin']);
  const parsed = changeRateSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return failed(parsed.error);
  if (!(await changeRate(parsed.data.id, parsed.data.amount)))
    return { ok: false, formError: 'This rate no longer exists.' };
  await recordAudit({
    actorId: user.id,
    action: 'rate_changed',
    entityType: 'rate_card',
    entityId: parsed.data.id,
    detail: { amountCents: parsed.data.amount },
  });
  revalidatePath('/admin/rates');
  return { ok: true, message: 'Saved.' };
}
