// Builders of the engine's coded reasons (types/codes.ts): what a reason refers to, as plain JSON.
import type {
  Custodian,
  EventRef,
  InspectionEvent,
  PartyRef,
  Reason,
  ReasonCode,
  ReasonCodes,
} from './types';

/** A reason with its parameters checked against the code. */
export function reason<C extends ReasonCode>(code: C, params: ReasonCodes[C]): Reason<C> {
  return { code, params } as Reason<C>;
}

/** The inspection a reason names, with its ISO time and who made it. */
export function eventRef(e: InspectionEvent): EventRef {
  if (e.type === 'walk') {
    return {
      type: 'walk',
      at: e.at.toISOString(),
      driverName: null,
      carrierName: null,
      jockeyName: e.jockeyName ?? null,
      correctedAt: null,
    };
  }
  return {
    type: e.type,
    at: e.at.toISOString(),
    driverName: e.party.driverName ?? null,
    carrierName: e.party.carrierName,
    jockeyName: null,
    correctedAt: e.correctedAt ? e.correctedAt.toISOString() : null,
  };
}

/** A custodian as a reason names it; the terminal by `terminalName` when the caller gave one. */
export function partyRef(c: Custodian, terminalName: string | null): PartyRef {
  return c.type === 'terminal'
    ? { type: 'terminal', name: terminalName }
    : { type: 'carrier', name: c.carrierName };
}
