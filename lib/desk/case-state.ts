// The life of a damage case, as a pure state machine. Callers pass `now` and the policy window;
// every accepted change returns the case_events row to store with it.
//
//   open ──notify──▶ notified ──dispute──▶ disputed ──decide──▶ decided ──close──▶ closed
//     │                 └────────────decide (no dispute)──────────▲
//     └──decide (absorb or waive only: nobody is charged, so nobody needs to be told first)──┘
//
// Charging or sharing needs the carrier to have been notified, so they had the chance to dispute.
import { TZDate } from '@date-fns/tz';
import { addDays } from 'date-fns';
import { formatMoney } from '@/lib/format/money';

export const CASE_STATES = ['open', 'notified', 'disputed', 'decided', 'closed'] as const;
export type CaseState = (typeof CASE_STATES)[number];
export const DECISIONS = ['charge', 'share', 'absorb', 'waive'] as const;
export type Decision = (typeof DECISIONS)[number];

export type CaseSnapshot = {
  state: CaseState;
  /** Estimate after any clerk override, in integer cents. */
  amountCents: number;
  disputeDeadline: Date | null;
  hasProposedCarrier: boolean;
};

export type CaseCommand =
  | { kind: 'notify' }
  | { kind: 'dispute'; note: string; photoIds?: string[] }
  | { kind: 'decide'; decision: Decision; chargedCents: number; reason: string }
  | { kind: 'close'; note?: string }
  | { kind: 'override'; overrideCents: number; reason: string };

export type TransitionContext = { now: Date; disputeWindowDays: number; timeZone: string };

export type CaseEventDraft = {
  kind: CaseCommand['kind'];
  fromState: CaseState;
  toState: CaseState;
  note: string | null;
};
export type TransitionResult =
  | { ok: true; toState: CaseState; event: CaseEventDraft; disputeDeadline?: Date }
  /** `field` names the form input the refusal is about, when there is one. */
  | { ok: false; reason: string; field?: 'note' | 'reason' | 'amount' | 'decision' };

/**
 * The last moment a dispute is accepted: the same local wall-clock time `days` calendar days
 * after notification, in the terminal's time zone (so a daylight-saving change does not move it).
 */
export function disputeDeadlineFrom(notifiedAt: Date, days: number, timeZone: string): Date {
  return new Date(addDays(new TZDate(notifiedAt, timeZone), days).getTime());
}

/** True when a dispute at `now` is inside the window (the deadline itself still counts). */
export function isWithinDisputeWindow(deadline: Date | null, now: Date): boolean {
  return deadline !== null && now.getTime() <= deadline.getTime();
}

const refuse = (reason: string, field?: 'note' | 'reason' | 'amount' | 'decision'): TransitionResult => ({
  ok: false,
  reason,
  ...(field ? { field } : {}),
});

export function applyCaseCommand(
  c: CaseSnapshot,
  cmd: CaseCommand,
  ctx: TransitionContext,
): TransitionResult {
  const from = c.state;
  const done = (toState: CaseState, note: string | null, disputeDeadline?: Date): TransitionResult => ({
    ok: true,
    toState,
    event: { kind: cmd.kind, fromState: from, toState, note },
    ...(disputeDeadline ? { disputeDeadline } : {}),
  });
  switch (cmd.kind) {
    case 'notify':
      if (from !== 'open') return refuse(`A case that is ${from} cannot be notified again.`);
      if (!c.hasProposedCarrier)
        return refuse('No carrier is proposed for this case, so there is nobody to notify.');
      if (c.amountCents <= 0) return refuse('Set an estimate before notifying the carrier.');
      return done('notified', null, disputeDeadlineFrom(ctx.now, ctx.disputeWindowDays, ctx.timeZone));
    case 'dispute':
      if (from !== 'notified')
        return refuse(
          from === 'disputed'
            ? 'This case is already disputed.'
            : `A case that is ${from} cannot be disputed.`,
        );
      if (!isWithinDisputeWindow(c.disputeDeadline, ctx.now))
        return refuse('The dispute window for this case has closed.');
      if (!cmd.note.trim()) return refuse('Say why you dispute the case.', 'note');
      return done('disputed', cmd.note.trim());
    case 'decide':
      return decide(c, cmd, done);
    case 'close':
      if (from !== 'decided') return refuse('Only a decided case can be closed.');
      return done('closed', cmd.note?.trim() || null);
    case 'override':
      if (from === 'decided' || from === 'closed')
        return refuse('The estimate cannot change after the decision.');
      if (!Number.isSafeInteger(cmd.overrideCents) || cmd.overrideCents < 0)
        return refuse('The amount must be whole cents, zero or more.', 'amount');
      if (!cmd.reason.trim()) return refuse('Give a reason for changing the estimate.', 'reason');
      return done(from, cmd.reason.trim());
  }
}

function decide(
  c: CaseSnapshot,
  cmd: Extract<CaseCommand, { kind: 'decide' }>,
  done: (to: CaseState, note: string | null) => TransitionResult,
): TransitionResult {
  const { decision, chargedCents } = cmd;
  if (c.state === 'decided' || c.state === 'closed') return refuse('This case is already decided.');
  if (c.state === 'open' && (decision === 'charge' || decision === 'share')) {
    return refuse('Notify the carrier before charging them, so they can dispute.', 'decision');
  }
  if (!cmd.reason.trim()) return refuse('Give a reason for the decision.', 'reason');
  if (!Number.isSafeInteger(chargedCents) || chargedCents < 0)
    return refuse('The amount must be whole cents, zero or more.', 'amount');
  if ((decision === 'absorb' || decision === 'waive') && chargedCents !== 0)
    return refuse(`Nothing is charged when you ${decision}.`, 'amount');
  if (decision === 'charge' && chargedCents <= 0) return refuse('Enter the amount to charge.', 'amount');
  if (decision === 'share' && (chargedCents <= 0 || chargedCents >= c.amountCents)) {
    return refuse('A shared charge is more than zero and less than the estimate.', 'amount');
  }
  return done('decided', cmd.reason.trim());
}

/** The note stored with the command's event: the amount first for an override or a decision. */
export function eventNote(cmd: CaseCommand, note: string | null): string | null {
  if (cmd.kind === 'override') return `${formatMoney(cmd.overrideCents)}: ${note}`;
  if (cmd.kind === 'decide') return `${cmd.decision} ${formatMoney(cmd.chargedCents)}: ${note}`;
  return note;
}

/** Which commands make sense now, for the case page's buttons. */
export function availableCommands(state: CaseState): CaseCommand['kind'][] {
  return {
    open: ['override', 'notify', 'decide'],
    notified: ['override', 'dispute', 'decide'],
    disputed: ['override', 'decide'],
    decided: ['close'],
    closed: [],
  }[state] as CaseCommand['kind'][];
}
