// A hook refused for an out-of-service defect. The handoff is not stored (custody stays with the
// terminal), but the refusal is audited, and a defect the driver's own pickup report found must
// keep the trailer in the yard for the next driver too, so its holds are placed anyway.
import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { listOpenHoldRows, lockTrailer } from '@/db/queries/handoff-submit';
import { insertHolds } from '@/db/queries/handoff-writes';
import { reason, type Hold } from '@/lib/engine';
import { holdsNotYetOpen, type HoldReason } from '@/lib/handoffs/holds';
import { englishReason } from '@/lib/i18n/reasons';
import { refuse, type Refusal } from '@/lib/result';
import type { HandoffSubmitInput } from '@/lib/validation/handoffs';
import type { HandoffActor } from './types';

/** What record.ts puts in a refused hook's detail; only `holds` goes back to the caller. */
type HookDetail = { holds: HoldReason[]; found?: Hold[]; timeZone?: string };

export function isRefusedHook(r: Refusal): r is Refusal & { detail: HookDetail } {
  return Array.isArray((r.detail as Partial<HookDetail> | undefined)?.holds);
}

/** Audits the refusal, places the holds the record found, and answers the refusal with the holds' reasons. */
export async function settleRefusedHook(
  r: Refusal & { detail: HookDetail },
  input: HandoffSubmitInput,
  actor: HandoffActor,
  now: Date,
): Promise<Refusal> {
  await db.transaction(async (tx) => {
    await recordAudit(
      {
        actorId: actor.id,
        action: 'handoff.hook_refused',
        entityType: 'trailer',
        entityId: input.trailerId,
        detail: { reasons: r.detail.holds.map((h) => h.reason), items: input.items },
      },
      tx,
    );
    if (!r.detail.found?.length) return;
    await lockTrailer(tx, input.trailerId, { noWait: false });
    const fresh = holdsNotYetOpen(r.detail.found, await listOpenHoldRows(tx, input.trailerId));
    const zone = r.detail.timeZone ?? 'UTC';
    await insertHolds(
      tx,
      fresh.map((h) => {
        const why = reason('hold.at_refused_hook', { reason: h.reason });
        return {
          trailerId: input.trailerId,
          handoffId: null,
          severity: h.severity,
          restriction: h.restriction,
          ruleKey: h.ruleKey,
          itemKey: h.itemKey,
          reason: englishReason(why, zone),
          reasonCode: why.code,
          reasonParams: why.params,
          source: h.source,
          caution: h.caution ? englishReason(h.caution, zone) : null,
          cautionCode: h.caution?.code ?? null,
          cautionParams: h.caution?.params ?? null,
          placedById: actor.id,
          placedAt: now,
        };
      }),
    );
  });
  return refuse(r.code, r.message, r.fieldErrors, { holds: r.detail.holds });
}
