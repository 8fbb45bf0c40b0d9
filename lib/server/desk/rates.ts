import 'server-only';
import type { z } from 'zod';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { addRate as insertRate, changeRate as updateRate } from '@/db/queries/rates';
import { abort, done, refuse, refuseField, settle, type Result } from '@/lib/result';
import type { addRateSchema, changeRateSchema } from '@/lib/validation/desk';

type Admin = { id: string };

/** Adds a rate to the rate card, audit-logged in the same transaction. */
export async function addRate(actor: Admin, input: z.output<typeof addRateSchema>): Promise<Result> {
  const { itemPattern, condition, amount } = input;
  return settle(() =>
    db.transaction(async (tx) => {
      if (!(await insertRate({ itemPattern, condition, amountCents: amount }, tx))) {
        return abort(
          refuseField(
            'conflict',
            'itemPattern',
            `${itemPattern} already has a ${condition} rate; change it in the list.`,
          ),
        );
      }
      await recordAudit(
        {
          actorId: actor.id,
          action: 'rate_added',
          entityType: 'rate_card',
          entityId: itemPattern,
          detail: { condition, amountCents: amount },
        },
        tx,
      );
      return done(undefined);
    }),
  );
}

/** Changes the amount of one rate, audit-logged in the same transaction. */
export async function changeRate(actor: Admin, input: z.output<typeof changeRateSchema>): Promise<Result> {
  return settle(() =>
    db.transaction(async (tx) => {
      if (!(await updateRate(input.id, input.amount, tx))) {
        return abort(refuse('not_found', 'This rate no longer exists.'));
      }
      await recordAudit(
        {
          actorId: actor.id,
          action: 'rate_changed',
          entityType: 'rate_card',
          entityId: input.id,
          detail: { amountCents: input.amount },
        },
        tx,
      );
      return done(undefined);
    }),
  );
}
