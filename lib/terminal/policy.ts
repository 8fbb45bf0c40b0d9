// A terminal's policy document (policies.data) read in one place: the engine's figures, the
// yard's and the desk's. A missing or malformed value falls back to its default, so a half-filled
// policy never stops the gate.
import { z } from 'zod';
import { defaultPolicy, type EnginePolicy } from '@/lib/engine';
import { DEFAULT_YARD_POLICY } from '@/lib/yard/policy';
import type { YardPolicy } from '@/lib/yard/types';
import {
  DEFAULT_PHOTO_POLICY,
  PHOTO_QUALITY_BOUNDS,
  PHOTO_SIDE_BOUNDS,
  type PhotoPolicy,
} from '@/lib/photos/policy';

export type DeskPolicy = { disputeWindowDays: number };
/** common practice: two weeks to answer a damage notice; a terminal may change it. */
export const DEFAULT_DESK_POLICY: DeskPolicy = { disputeWindowDays: 14 };

export type GatePolicy = { correctionWindowMinutes: number };
/**
 * common practice: the driver who recorded a handoff may correct it while still at the gate,
 * about half an hour; later corrections go through the clerk, with a reason.
 */
export const DEFAULT_GATE_POLICY: GatePolicy = { correctionWindowMinutes: 30 };

export type TerminalPolicy = {
  engine: EnginePolicy;
  yard: YardPolicy;
  desk: DeskPolicy;
  gate: GatePolicy;
  photo: PhotoPolicy;
};

const d = defaultPolicy;
const eighths = (fallback: number) => z.number().int().min(0).max(8).catch(fallback);
const positive = (fallback: number, max: number) => z.number().positive().max(max).catch(fallback);

const schema = z.object({
  requiredFuelEighthsAtDrop: eighths(d.requiredFuelEighthsAtDrop),
  requiredFuelEighthsAtHook: eighths(d.requiredFuelEighthsAtHook),
  reeferBurnGallonsPerHour: positive(d.reeferBurnGallonsPerHour, 10),
  fuelDropToleranceEighths: z.number().min(0).max(8).catch(d.fuelDropToleranceEighths),
  defaultTankGallons: positive(d.defaultTankGallons, 500),
  preTripMaxAgeHours: positive(d.preTripMaxAgeHours, 24 * 365),
  minTreadThirtySeconds: z.number().min(0).max(32).catch(d.minTreadThirtySeconds),
  spareHoldSeverity: z.enum(['out_of_service', 'restricted']).catch(d.spareHoldSeverity),
  freeTimeHours: positive(DEFAULT_YARD_POLICY.freeTimeHours, 24 * 365),
  lowFuelEighths: eighths(DEFAULT_YARD_POLICY.lowFuelEighths),
  disputeWindowDays: z.number().int().min(1).max(365).catch(DEFAULT_DESK_POLICY.disputeWindowDays),
  correctionWindowMinutes: z
    .number()
    .int()
    .min(0)
    .max(24 * 60)
    .catch(DEFAULT_GATE_POLICY.correctionWindowMinutes),
  photoLongestSidePx: z
    .number()
    .int()
    .min(PHOTO_SIDE_BOUNDS.min)
    .max(PHOTO_SIDE_BOUNDS.max)
    .catch(DEFAULT_PHOTO_POLICY.longestSidePx),
  photoQuality: z
    .number()
    .min(PHOTO_QUALITY_BOUNDS.min)
    .max(PHOTO_QUALITY_BOUNDS.max)
    .catch(DEFAULT_PHOTO_POLICY.quality),
});

/** The terminal's policy from its stored document (`null` when the terminal has none yet). */
export function terminalPolicyOf(data: unknown): TerminalPolicy {
  const doc = typeof data === 'object' && data !== null ? data : {};
  const p = schema.parse(doc);
  return {
    engine: {
      requiredFuelEighthsAtDrop: p.requiredFuelEighthsAtDrop,
      requiredFuelEighthsAtHook: p.requiredFuelEighthsAtHook,
      reeferBurnGallonsPerHour: p.reeferBurnGallonsPerHour,
      fuelDropToleranceEighths: p.fuelDropToleranceEighths,
      defaultTankGallons: p.defaultTankGallons,
      preTripMaxAgeHours: p.preTripMaxAgeHours,
      minTreadThirtySeconds: p.minTreadThirtySeconds,
      spareHoldSeverity: p.spareHoldSeverity,
    },
    yard: { freeTimeHours: p.freeTimeHours, lowFuelEighths: p.lowFuelEighths },
    desk: { disputeWindowDays: p.disputeWindowDays },
    gate: { correctionWindowMinutes: p.correctionWindowMinutes },
    photo: { longestSidePx: p.photoLongestSidePx, quality: p.photoQuality },
  };
}
