// A submitted handoff as the engine reads it and as it is stored. Pure: the submit service
// passes the ids, the time and the looked-up carrier.
import type { HandoffEvent, ItemObservations } from '@/lib/engine';
import type { HandoffSubmitInput } from '@/lib/validation/handoffs';
import type { HandoffHashRow } from './canonical';
import { canonicalJson, sha256Hex } from './hash';

/**
 * The fingerprint of a submitted body (after parsing), stored with its draft key: a retry must
 * send the same body, or it is a different handoff reusing the key.
 */
export function submissionHash(input: HandoffSubmitInput): string {
  return sha256Hex(canonicalJson(input));
}

type Party = { carrierId: string; carrierName: string; driverId: string | null };

/** The submitted record as the engine's drop/hook event (reefer readings only for a reefer). */
export function handoffEvent(
  input: HandoffSubmitInput,
  x: { id: string; at: Date; party: Party; isReefer: boolean; observations: ItemObservations },
): HandoffEvent {
  const r = x.isReefer ? input.reefer : null;
  return {
    type: input.kind,
    id: x.id,
    at: x.at,
    party: {
      carrierId: x.party.carrierId,
      carrierName: x.party.carrierName,
      ...(x.party.driverId ? { driverId: x.party.driverId } : {}),
      driverName: input.driverName,
    },
    items: x.observations,
    fuelEighths: x.isReefer ? input.fuelEighths : null,
    reefer: r
      ? {
          isUnitOn: r.isUnitOn,
          setpointF: r.setpointF,
          returnAirF: r.returnAirF,
          engineHours: r.engineHours,
          preTrip:
            r.preTripResult !== 'not_run' && r.preTripAt
              ? { result: r.preTripResult === 'pass' ? 'passed' : 'failed', at: new Date(r.preTripAt) }
              : null,
        }
      : null,
    isLoaded: input.isLoaded,
    sealNumber: input.sealNumber ?? null,
  };
}

export type HandoffRow = HandoffHashRow & {
  kind: 'drop' | 'hook';
  level: 'full';
  pretripResult: 'pass' | 'fail' | 'not_run' | null;
  idempotencyKey: string;
};

const tenths = (v: number | null | undefined) => (v == null ? null : Math.round(v * 10));

/** The handoffs row (without its content hash): readings in tenths, as the table keeps them. */
export function handoffRow(
  input: HandoffSubmitInput,
  x: {
    id: string;
    trailerId: string;
    terminalId: string;
    event: HandoffEvent;
    /** When it is stored; the chain orders by it. Defaults to the event's time. */
    occurredAt?: Date;
    recordedById: string;
    verificationCode: string;
    prevHash: string | null;
  },
): HandoffRow {
  const r = x.event.reefer ? input.reefer : null;
  return {
    id: x.id,
    trailerId: x.trailerId,
    terminalId: x.terminalId,
    kind: input.kind,
    level: 'full',
    carrierId: x.event.party.carrierId,
    driverId: x.event.party.driverId ?? null,
    driverName: input.driverName,
    tractorNumber: input.tractorNumber,
    recordedById: x.recordedById,
    isLoaded: input.isLoaded,
    sealNumber: input.sealNumber ?? null,
    fuelEighths: x.event.fuelEighths ?? null,
    isReeferOn: r?.isUnitOn ?? null,
    setpointTenthsF: tenths(r?.setpointF),
    returnAirTenthsF: tenths(r?.returnAirF),
    engineHoursTenths: tenths(r?.engineHours),
    pretripResult: r?.preTripResult ?? null,
    pretripAt: r?.preTripAt ? new Date(r.preTripAt) : null,
    note: input.note ?? null,
    occurredAt: x.occurredAt ?? x.event.at,
    idempotencyKey: input.idempotencyKey,
    correctsHandoffId: input.correctsHandoffId ?? null,
    correctionReason: input.correctsHandoffId ? (input.correctionReason ?? null) : null,
    verificationCode: x.verificationCode,
    prevHash: x.prevHash,
  };
}

/** The trailer's last readings as a handoff recorded them. */
export function readingsOf(row: HandoffRow) {
  return {
    isLoaded: row.isLoaded,
    fuelEighths: row.fuelEighths,
    isReeferOn: row.isReeferOn,
    setpointTenthsF: row.setpointTenthsF,
  };
}

/** Where the trailer stands after the handoff: in the yard on its slot after a drop, on the road after a hook. */
export function trailerAfter(row: HandoffRow, spotId: string | null) {
  const readings = { lastSeenAt: row.occurredAt, ...readingsOf(row) };
  return row.kind === 'drop'
    ? {
        status: 'in_yard' as const,
        currentTerminalId: row.terminalId,
        currentSpotId: spotId,
        gateInAt: row.occurredAt,
        ...readings,
      }
    : {
        status: 'on_road' as const,
        currentTerminalId: null,
        currentSpotId: null,
        gateInAt: null,
        ...readings,
      };
}
