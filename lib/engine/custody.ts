import type { Custodian, CustodyLeg, Party, TimelineEvent } from './types';

const TERMINAL: Custodian = Object.freeze({ type: 'terminal' });

/** The carrier holding the trailer just after the event (a hook), or null for the terminal. */
function partyAfter(e: TimelineEvent): Party | null {
  return e.type === 'hook' ? e.party : null;
}

/** The carrier that held the trailer just before the event (a drop), or null for the terminal. */
function partyBefore(e: TimelineEvent): Party | null {
  return e.type === 'drop' ? e.party : null;
}

function sameParty(a: Party | null, b: Party | null): boolean {
  return a === null || b === null ? a === b : a.carrierId === b.carrierId;
}

function custodianOf(p: Party | null): Custodian {
  if (p === null) return TERMINAL;
  return p.driverName === undefined
    ? { type: 'carrier', carrierId: p.carrierId, carrierName: p.carrierName }
    : { type: 'carrier', carrierId: p.carrierId, carrierName: p.carrierName, driverName: p.driverName };
}

/** Who holds the trailer just after the event: a hook hands it to the driver's carrier. */
export function custodianAfter(event: TimelineEvent): Custodian {
  return custodianOf(partyAfter(event));
}

/** Who held the trailer just before the event: a drop comes from the driver's carrier. */
export function custodianBefore(event: TimelineEvent): Custodian {
  return custodianOf(partyBefore(event));
}

/** Identity of a custodian for grouping: custody is by carrier, not by driver. */
export function custodianKey(c: Custodian): string {
  return c.type === 'terminal' ? 'terminal' : `carrier:${c.carrierId}`;
}

/** Display name: the carrier's name, or `terminalName` (default "the terminal"). */
export function custodianName(c: Custodian, terminalName = 'the terminal'): string {
  return c.type === 'terminal' ? terminalName : c.carrierName;
}

function leg(
  c: Custodian,
  from: TimelineEvent | null,
  to: TimelineEvent | null,
  unrecorded: boolean,
): CustodyLeg {
  return {
    custodian: c,
    fromEventId: from?.id ?? null,
    from: from?.at ?? null,
    toEventId: to?.id ?? null,
    to: to?.at ?? null,
    isUnrecordedChange: unrecorded,
  };
}

/**
 * Legs between consecutive events of `events` (oldest first), from the first to the last.
 * When an event's outgoing custodian differs from the next event's incoming one (hooked by one
 * carrier, dropped by another), both get a leg over that interval, flagged `isUnrecordedChange`.
 * Consecutive legs of one custodian merge: drop → move → walk → hook is one terminal leg.
 */
export function legsAlong(events: readonly TimelineEvent[]): CustodyLeg[] {
  const legs: CustodyLeg[] = [];
  let open: CustodyLeg | null = null;
  let openParty: Party | null = null;
  for (let i = 1; i < events.length; i++) {
    const a = events[i - 1];
    const b = events[i];
    const out = partyAfter(a);
    const inc = partyBefore(b);
    if (!sameParty(out, inc)) {
      legs.push(leg(custodianOf(out), a, b, true), leg(custodianOf(inc), a, b, true));
      open = null;
    } else if (open && sameParty(openParty, out)) {
      open.toEventId = b.id;
      open.to = b.at;
    } else {
      open = leg(custodianOf(out), a, b, false);
      openParty = out;
      legs.push(open);
    }
  }
  return legs;
}

/** The legs between two consecutive events (one, or two when the ends disagree). */
export function legsBetweenEvents(a: TimelineEvent, b: TimelineEvent): CustodyLeg[] {
  return legsAlong([a, b]);
}

/**
 * Custody legs of a whole timeline (oldest first): the leg before the first event (the
 * dropping carrier, or the terminal), the legs along it (see `legsAlong`), and the open leg
 * after the last. Moves and walks keep custody with the terminal.
 */
export function buildCustodyLegs(timeline: readonly TimelineEvent[]): CustodyLeg[] {
  if (timeline.length === 0) return [];
  const first = timeline[0];
  const last = timeline[timeline.length - 1];
  const legs = [leg(custodianBefore(first), null, first, false), ...legsAlong(timeline)];
  const tail = legs[legs.length - 1];
  if (
    legs.length > 1 &&
    !tail.isUnrecordedChange &&
    custodianKey(tail.custodian) === custodianKey(custodianAfter(last))
  ) {
    tail.toEventId = null;
    tail.to = null;
  } else {
    legs.push(leg(custodianAfter(last), last, null, false));
  }
  return legs;
}

/** Who holds the trailer now, after the last event; null for an empty timeline. */
export function currentCustodian(timeline: readonly TimelineEvent[]): Custodian | null {
  return timeline.length === 0 ? null : custodianAfter(timeline[timeline.length - 1]);
}
