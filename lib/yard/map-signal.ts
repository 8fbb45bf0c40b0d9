// What one occupied slot of the yard map signals, strongest first. Pure.
import { isLowFuel, isReeferOff } from './board';
import type { BoardTrailer, YardPolicy } from './types';

export type SlotTone = 'out_of_service' | 'reefer_off' | 'restricted' | 'low_fuel' | null;

/** The words on a slot, in the order they are shown (out of service always first). */
export type SlotFlags = { tone: SlotTone; words: string[] };

export const SLOT_WORDS = {
  out_of_service: 'OUT OF SERVICE',
  restricted: 'RESTRICTED',
  reefer_off: 'REEFER OFF',
  low_fuel: (eighths: number | null) => `FUEL ${eighths}/8`,
  legend: (lowFuelEighths: number) =>
    `OUT OF SERVICE: may not leave the gate (red fill) · RESTRICTED: yard moves or loads limited · ` +
    `FUEL: at or below ${lowFuelEighths}/8 · REEFER OFF: unit not running on a loaded trailer`,
} as const;

/**
 * Out of service is the strongest signal: it takes the slot's tone over every other flag and its
 * words come first. A loaded reefer with the unit off comes next, then a restriction, then low fuel.
 */
export function slotFlags(t: BoardTrailer, policy: YardPolicy): SlotFlags {
  const oos = t.holds.some((h) => h.severity === 'out_of_service');
  const restricted = !oos && t.holds.some((h) => h.severity === 'restricted');
  const low = isLowFuel(t, policy);
  // an empty reefer normally stands with its unit shut off (common practice); only a loaded one is a concern
  const off = isReeferOff(t) && t.isLoaded;
  const words = [
    oos ? SLOT_WORDS.out_of_service : null,
    restricted ? SLOT_WORDS.restricted : null,
    off ? SLOT_WORDS.reefer_off : null,
    low ? SLOT_WORDS.low_fuel(t.fuelEighths) : null,
  ].filter((w): w is string => w !== null);
  const tone: SlotTone = oos
    ? 'out_of_service'
    : off
      ? 'reefer_off'
      : restricted
        ? 'restricted'
        : low
          ? 'low_fuel'
          : null;
  return { tone, words };
}
