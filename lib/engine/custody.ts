import type { Custodian, CustodyLeg, TimelineEvent } from './types';

const TERMINAL: Custodian = { type: 'terminal' };

/** Who holds the trailer just after the event: a hook hands it to the driver's carrier. */
export function custodianAfter(event: TimelineEvent): Custodian {
  if (event.type === 'hook') return carrierOf(event);
  return TERMINAL;
}

/** Who held the trailer just before the event: a drop comes from the driver's carrier. */
export function custodianBefore(event: TimelineEvent): Custodian {
  if (event.type === 'drop') return carrierOf(event);
  return TERMINAL;
}

function carrierOf(event: Extract<TimelineEvent, { type: 'drop' | 'hook' }>): Custodian {
  const { carrierId, carrierName, driverName } = event.party;
  return driverName === undefined
    ? { type: 'carrier', carrierId, carrierName }
    : { type: 'carrier', carrierId, carrierName, driverName };
}

/** Identity of a custodian for grouping: custody is by carrier, not by driver. */
export function custodianKey(c: Custodian): string {
  return c.type === 'terminal' ? 'terminal' : `carrier:${c.carrierId}`;
}

/** Display name: the carrier's name, or `terminalName` (default "the terminal"). */
export function custodianName(c: Custodian, terminalName = 'the terminal'): string {
  return c.type === 'terminal' ? terminalName : c.carrierName;
}

function leg(c: Custodian, from: TimelineEvent | null, to: TimelineEvent | null, unrecorded: boolean): CustodyLeg {
  return {
    custodian: c,
    fromEventId: from?.id ?? null,
    from: from?.at ?? null,
    toEventId: to?.id ?? null,
    to: to?.at ?? null,
    isUnrecordedChange: unrecorded,
  };
}

/** The legs between two consecutive events (one, or two when the ends disagree). */
export function legsBetweenEvents(a: TimelineEvent, b: TimelineEvent): CustodyLeg[] {
  const out = custodianAfter(a);
  const inc = custodianBefore(b);
  if (custodianKey(out) === custodianKey(inc)) return [leg(out, a, b, false)];
  return [leg(out, a, b, true), leg(inc, a, b, true)];
}

/**
 * Appends a leg, merging it into the previous one when the same custodian simply continues
 * (drop → move → walk → hook is one terminal leg, not three).
 */
export function appendLeg(legs: CustodyLeg[], next: CustodyLeg): void {
  const last = legs[legs.length - 1];
  if (last && !last.isUnrecordedChange && !next.isUnrecordedChange
    && last.toEventId === next.fromEventId && custodianKey(last.custodian) === custodianKey(next.custodian)) {
    last.toEventId = next.toEventId;
    last.to = next.to;
    return;
  }
  legs.push(next);
}

/**
 * Custody legs of a timeline (oldest first): the leg before the first event (the dropping
 * carrier, or the terminal), one or two legs between each pair of events, and the open leg after the
 * last, with consecutive legs of the same custodian merged. Moves and walks keep custody with
 * the terminal.
 */
export function buildCustodyLegs(timeline: readonly TimelineEvent[]): CustodyLeg[] {
  if (timeline.length === 0) return [];
  const legs: CustodyLeg[] = [leg(custodianBefore(timeline[0]), null, timeline[0], false)];
  for (let i = 1; i < timeline.length; i++) {
    for (const l of legsBetweenEvents(timeline[i - 1], timeline[i])) appendLeg(legs, l);
  }
  appendLeg(legs, leg(custodianAfter(timeline[timeline.length - 1]), timeline[timeline.length - 1], null, false));
  return legs;
}

/** Who holds the trailer now, after the last event; null for an empty timeline. */
export function currentCustodian(timeline: readonly TimelineEvent[]): Custodian | null {
  return timeline.length === 0 ? null : custodianAfter(timeline[timeline.length - 1]);
}
