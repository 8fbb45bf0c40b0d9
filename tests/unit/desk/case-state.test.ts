import { describe, expect, it } from 'vitest';
import {
  applyCaseCommand,
  availableCommands,
  eventNote,
  CASE_STATES,
  disputeDeadlineFrom,
  isWithinDisputeWindow,
  type CaseCommand,
  type CaseSnapshot,
  type CaseState,
} from '@/lib/desk/case-state';

const now = new Date('2026-11-02T15:00:00Z');
const ctx = { now, disputeWindowDays: 14, timeZone: 'America/Chicago' };
const snap = (state: CaseState, over: Partial<CaseSnapshot> = {}): CaseSnapshot => ({
  state,
  amountCents: 85_000,
  disputeDeadline: new Date('2026-11-16T15:00:00Z'),
  hasProposedCarrier: true,
  ...over,
});

const commands: Record<string, CaseCommand> = {
  notify: { kind: 'notify' },
  dispute: { kind: 'dispute', note: 'The skin was torn when I hooked it.' },
  charge: {
    kind: 'decide',
    decision: 'charge',
    chargedCents: 85_000,
    reason: 'Photos show the tear at drop.',
  },
  absorb: { kind: 'decide', decision: 'absorb', chargedCents: 0, reason: 'Yard damage.' },
  close: { kind: 'close' },
};

// The allowed changes, as designed in lib/desk/case-state.ts; every other pair must be refused.
const ALLOWED: Record<string, CaseState[]> = {
  notify: ['open'],
  dispute: ['notified'],
  charge: ['notified', 'disputed'],
  absorb: ['open', 'notified', 'disputed'],
  close: ['decided'],
};
const TARGET: Record<string, CaseState> = {
  notify: 'notified',
  dispute: 'disputed',
  charge: 'decided',
  absorb: 'decided',
  close: 'closed',
};

describe('case state machine', () => {
  for (const [name, cmd] of Object.entries(commands)) {
    for (const state of CASE_STATES) {
      const allowed = ALLOWED[name].includes(state);
      it(`${name} from ${state} is ${allowed ? 'allowed' : 'refused'}`, () => {
        const r = applyCaseCommand(snap(state), cmd, ctx);
        expect(r.ok).toBe(allowed);
        if (r.ok) {
          expect(r.toState).toBe(TARGET[name]);
          expect(r.event).toMatchObject({ kind: cmd.kind, fromState: state, toState: TARGET[name] });
        } else {
          expect(r.reason.length).toBeGreaterThan(10);
        }
      });
    }
  }

  it('notifying sets the dispute deadline from the policy window', () => {
    const r = applyCaseCommand(snap('open', { disputeDeadline: null }), commands.notify, ctx);
    expect(r.ok && r.disputeDeadline?.toISOString()).toBe('2026-11-16T15:00:00.000Z');
  });

  it('refuses to notify without a proposed carrier or without an estimate', () => {
    expect(applyCaseCommand(snap('open', { hasProposedCarrier: false }), commands.notify, ctx)).toMatchObject(
      { ok: false },
    );
    expect(applyCaseCommand(snap('open', { amountCents: 0 }), commands.notify, ctx)).toMatchObject({
      ok: false,
      reason: /estimate/,
    });
  });

  it('a share is more than zero and less than the estimate', () => {
    const share = (chargedCents: number) =>
      applyCaseCommand(
        snap('disputed'),
        { kind: 'decide', decision: 'share', chargedCents, reason: 'Both had it.' },
        ctx,
      );
    expect(share(42_500).ok).toBe(true);
    expect(share(0).ok).toBe(false);
    expect(share(85_000).ok).toBe(false);
    expect(share(12.5).ok).toBe(false); // not whole cents
  });

  it('absorb and waive charge nothing; a decision needs a reason', () => {
    expect(
      applyCaseCommand(
        snap('open'),
        { kind: 'decide', decision: 'waive', chargedCents: 100, reason: 'x' },
        ctx,
      ).ok,
    ).toBe(false);
    expect(
      applyCaseCommand(
        snap('notified'),
        { kind: 'decide', decision: 'charge', chargedCents: 100, reason: '  ' },
        ctx,
      ).ok,
    ).toBe(false);
  });

  it('an override keeps the state, needs a reason and whole cents, and stops after the decision', () => {
    const ok = applyCaseCommand(
      snap('notified'),
      { kind: 'override', overrideCents: 60_000, reason: 'Body shop quote.' },
      ctx,
    );
    expect(ok).toMatchObject({
      ok: true,
      toState: 'notified',
      event: { kind: 'override', note: 'Body shop quote.' },
    });
    expect(
      applyCaseCommand(snap('open'), { kind: 'override', overrideCents: 600.5, reason: 'q' }, ctx).ok,
    ).toBe(false);
    expect(
      applyCaseCommand(snap('decided'), { kind: 'override', overrideCents: 600, reason: 'q' }, ctx).ok,
    ).toBe(false);
  });

  it('names the input a refusal is about, so the form shows it there', () => {
    const decide = (decision: 'charge' | 'share' | 'waive', chargedCents: number, reason = 'Both had it.') =>
      applyCaseCommand(snap('disputed'), { kind: 'decide', decision, chargedCents, reason }, ctx);
    expect(decide('share', 85_000)).toMatchObject({ ok: false, field: 'amount' });
    expect(decide('waive', 100)).toMatchObject({ ok: false, field: 'amount' });
    expect(decide('charge', 100, ' ')).toMatchObject({ ok: false, field: 'reason' });
    const early = applyCaseCommand(
      snap('open'),
      { kind: 'decide', decision: 'charge', chargedCents: 100, reason: 'Clear photos.' },
      ctx,
    );
    expect(early).toMatchObject({ ok: false, field: 'decision' });
    // a refusal about the case's state concerns no input
    const twice = applyCaseCommand(snap('notified'), commands.notify, ctx);
    expect(twice.ok).toBe(false);
    expect(twice).not.toHaveProperty('field');
  });

  it('stores the amount first in the note of an override or a decision', () => {
    const override = { kind: 'override', overrideCents: 60_000, reason: 'Body shop quote.' } as const;
    expect(eventNote(override, 'Body shop quote.')).toBe('$600.00: Body shop quote.');
    const decision = { kind: 'decide', decision: 'share', chargedCents: 42_550, reason: 'Split.' } as const;
    expect(eventNote(decision, 'Split.')).toBe('share $425.50: Split.');
    expect(eventNote(commands.notify, null)).toBeNull();
  });

  it('offers the buttons that match the allowed changes', () => {
    expect(availableCommands('closed')).toEqual([]);
    expect(availableCommands('notified')).toContain('dispute');
    expect(availableCommands('open')).not.toContain('dispute');
  });
});

describe('dispute window', () => {
  const deadline = new Date('2026-11-16T15:00:00Z');
  it('accepts a dispute at the deadline itself and refuses one a millisecond later', () => {
    expect(isWithinDisputeWindow(deadline, deadline)).toBe(true);
    expect(isWithinDisputeWindow(deadline, new Date(deadline.getTime() + 1))).toBe(false);
    const at = (t: Date) =>
      applyCaseCommand(snap('notified', { disputeDeadline: deadline }), commands.dispute, { ...ctx, now: t });
    expect(at(deadline).ok).toBe(true);
    expect(at(new Date(deadline.getTime() + 1))).toMatchObject({ ok: false, reason: /window/ });
  });

  it('counts calendar days in the terminal zone across the start of daylight saving time', () => {
    // IANA tz database (checked with @date-fns/tz): America/Chicago moves from CST (UTC−6) to CDT
    // (UTC−5) on Sunday 8 March 2026, the second Sunday of March. Notified 1 March 10:00 CST
    // (16:00Z); 14 days later is 15 March 10:00 CDT = 15:00Z, one hour short of 14 × 24 h.
    const d = disputeDeadlineFrom(new Date('2026-03-01T16:00:00Z'), 14, 'America/Chicago');
    expect(d.toISOString()).toBe('2026-03-15T15:00:00.000Z');
    // In UTC itself there is no shift: exactly 14 × 24 h.
    expect(disputeDeadlineFrom(new Date('2026-03-01T16:00:00Z'), 14, 'UTC').toISOString()).toBe(
      '2026-03-15T16:00:00.000Z',
    );
  });

  it('has no window before notification', () => {
    expect(isWithinDisputeWindow(null, now)).toBe(false);
  });
});
