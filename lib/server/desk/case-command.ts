import 'server-only';
import { db } from '@/db';
import {
  attachPhotosToEvent,
  countAttachablePhotos,
  insertCaseEvent,
  lockCase,
  updateCase,
} from '@/db/queries/case-changes';
import type { CaseViewer } from '@/db/queries/case-visibility';
import { applyCaseCommand, eventNote, type CaseCommand, type CaseState } from '@/lib/desk/case-state';
import { effectiveAmountCents } from '@/lib/desk/estimate';
import { abort, done, refuse, refuseField, settle, type Result } from '@/lib/result';
import { terminalPolicyOf } from '@/lib/terminal/policy';
import { queueCaseEmail } from './case-mail';

/** Who gives the command: a signed-in person, or (id null) the carrier through a signed link. */
export type CaseActor = CaseViewer & { id: string | null };
export type CaseCommandDone = { toState: CaseState; eventId: string };
export type CaseCommandOptions = {
  now?: Date;
  /** The demo seed walks cases through their states without writing e-mails. */
  sendEmail?: boolean;
};

const NOT_YOURS = 'This case does not exist or is not yours.';
const PHOTO_GONE = 'A photo is missing, still uploading, or belongs to another record. Take it again.';

/**
 * Applies one command to a case in one transaction: the state machine decides, the case and its
 * new event are written, dispute photos are attached, and notify and decide queue their e-mail.
 * The actor's ownership is part of the case lookup, so a driver never touches another carrier's case.
 */
export async function runCaseCommand(
  actor: CaseActor,
  input: { caseId: string; command: CaseCommand },
  opts: CaseCommandOptions = {},
): Promise<Result<CaseCommandDone>> {
  const { caseId, command } = input;
  const now = opts.now ?? new Date();
  return settle(() =>
    db.transaction(async (tx) => {
      const row = await lockCase(tx, caseId, actor);
      if (!row) return abort(refuse('not_found', NOT_YOURS));
      const c = row.c;
      const amountCents = effectiveAmountCents(c);
      const result = applyCaseCommand(
        {
          state: c.state,
          amountCents,
          disputeDeadline: c.disputeDeadline,
          hasProposedCarrier: !!c.proposedCarrierId,
        },
        command,
        {
          now,
          disputeWindowDays: terminalPolicyOf(row.policy).desk.disputeWindowDays,
          timeZone: row.timeZone,
        },
      );
      if (!result.ok) {
        return abort(
          result.field
            ? refuseField('conflict', result.field, result.reason)
            : refuse('conflict', result.reason),
        );
      }
      const photos = {
        photoIds: command.kind === 'dispute' ? (command.photoIds ?? []) : [],
        trailerId: c.trailerId,
        uploadedById: actor.id,
      };
      if ((await countAttachablePhotos(tx, photos)) !== photos.photoIds.length) {
        return abort(refuseField('conflict', 'photoIds', PHOTO_GONE));
      }

      await updateCase(tx, caseId, {
        state: result.toState,
        updatedAt: now,
        ...(result.disputeDeadline ? { disputeDeadline: result.disputeDeadline } : {}),
        ...(command.kind === 'override'
          ? { overrideCents: command.overrideCents, overrideReason: command.reason.trim() }
          : {}),
        ...(command.kind === 'decide'
          ? {
              decision: command.decision,
              chargedCents: command.chargedCents,
              decisionReason: command.reason.trim(),
            }
          : {}),
      });
      const eventId = await insertCaseEvent(tx, {
        caseId,
        kind: result.event.kind,
        fromState: result.event.fromState,
        toState: result.event.toState,
        actorId: actor.id,
        note: eventNote(command, result.event.note),
        createdAt: now,
      });
      await attachPhotosToEvent(tx, photos, eventId);
      if (opts.sendEmail !== false) {
        await queueCaseEmail(tx, row, command, amountCents, result.disputeDeadline);
      }
      return done({ toState: result.toState, eventId });
    }),
  );
}
