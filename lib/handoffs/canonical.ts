// Which fields of a stored handoff the hash chain covers. The submit service hashes with this,
// and the desk re-verifies a trailer's chain with the same function, so the two never drift.
import { PERISHABLE_HASH_VERSION, type HashableHandoff } from './hash';

export type HandoffHashRow = {
  id: string;
  trailerId: string;
  terminalId: string;
  kind: string;
  level: string;
  carrierId: string;
  driverId: string | null;
  driverName: string;
  tractorNumber: string;
  recordedById: string;
  isLoaded: boolean;
  sealNumber: string | null;
  fuelEighths: number | null;
  isReeferOn: boolean | null;
  setpointTenthsF: number | null;
  returnAirTenthsF: number | null;
  engineHoursTenths: number | null;
  pretripResult: string | null;
  pretripAt: Date | null;
  note: string | null;
  /** A hook's answer to "is the load perishable?": hashed from hash_version 3 on. */
  isLoadPerishable?: boolean | null;
  occurredAt: Date;
  correctsHandoffId: string | null;
  /** Absent or null leaves the hash of a record without one as it was. */
  correctionReason?: string | null;
  verificationCode: string;
  prevHash: string | null;
};
export type HandoffItemHashRow = {
  itemKey: string;
  condition: string;
  treadThirtySeconds: number | null;
  isHoldingAir: boolean | null;
  note: string | null;
  details?: Record<string, boolean | string> | null;
};

/**
 * The hash input of one handoff from its stored rows and the SHA-256 of its stored photos, as
 * its hash_version defines it: from version 3 on the content always holds `isLoadPerishable`
 * (null included), so a version-3 input never equals a version-2 one and relabelling a row's
 * version cannot drop the answer from the hash.
 */
export function hashableFromRows(
  h: HandoffHashRow,
  items: HandoffItemHashRow[],
  photoSha256s: string[],
  hashVersion: number,
): HashableHandoff {
  return {
    content: {
      id: h.id,
      trailerId: h.trailerId,
      terminalId: h.terminalId,
      kind: h.kind,
      level: h.level,
      carrierId: h.carrierId,
      driverId: h.driverId,
      driverName: h.driverName,
      tractorNumber: h.tractorNumber,
      recordedById: h.recordedById,
      isLoaded: h.isLoaded,
      sealNumber: h.sealNumber,
      fuelEighths: h.fuelEighths,
      isReeferOn: h.isReeferOn,
      setpointTenthsF: h.setpointTenthsF,
      returnAirTenthsF: h.returnAirTenthsF,
      engineHoursTenths: h.engineHoursTenths,
      pretripResult: h.pretripResult,
      pretripAt: h.pretripAt ? h.pretripAt.toISOString() : null,
      note: h.note,
      ...(hashVersion >= PERISHABLE_HASH_VERSION ? { isLoadPerishable: h.isLoadPerishable ?? null } : {}),
      occurredAt: h.occurredAt.toISOString(),
      correctsHandoffId: h.correctsHandoffId,
      ...(h.correctionReason ? { correctionReason: h.correctionReason } : {}),
      verificationCode: h.verificationCode,
    },
    items: items.map((i) => ({
      itemKey: i.itemKey,
      condition: i.condition,
      treadThirtySeconds: i.treadThirtySeconds,
      isHoldingAir: i.isHoldingAir,
      note: i.note,
      details: i.details && Object.keys(i.details).length ? i.details : null,
    })),
    photoSha256s,
    prevHash: h.prevHash,
  };
}
