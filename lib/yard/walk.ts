import type { YardWalkEvent } from '@/lib/engine';
import type { YardPolicy } from './types';

export interface WalkSpot {
  id: string;
  label: string;
  rowId: string;
}

/** The slot after the last one confirmed, in row order; the first slot when nothing is confirmed yet. */
export function suggestNextSpot(spots: readonly WalkSpot[], lastSpotId: string | null): WalkSpot | null {
  if (spots.length === 0) return null;
  if (lastSpotId === null) return spots[0];
  const i = spots.findIndex((s) => s.id === lastSpotId);
  return i === -1 ? spots[0] : (spots[i + 1] ?? null);
}

export interface QuickChecks {
  isUnitRunning: boolean | null;
  setpointTenthsF: number | null;
  fuelEighths: number | null;
  areDoorsClosed: boolean | null;
  isSealPresent: boolean | null;
}

export interface StoredWalkScan extends QuickChecks {
  id: string;
  scannedAt: Date;
}

/**
 * A walk scan as the engine's timeline event. The quick checks cover readings only (fuel,
 * unit running, setpoint): "doors closed" and "seal present" say nothing about the condition
 * of a checklist item (an open door is not a damaged one, and the load seal is not the door
 * gasket `rear.door_*.seal`), so `items` stays empty and no item is falsely marked inspected.
 */
export function walkScanEvent(scan: StoredWalkScan, jockeyName?: string): YardWalkEvent {
  return {
    type: 'walk',
    id: scan.id,
    at: scan.scannedAt,
    jockeyName,
    items: {},
    fuelEighths: scan.fuelEighths,
    reefer: {
      isUnitOn: scan.isUnitRunning,
      setpointF: scan.setpointTenthsF === null ? null : scan.setpointTenthsF / 10,
    },
  };
}

export type TaskKind = 'low_fuel' | 'unit_off' | 'doors_open' | 'seal_missing';

export const TASK_LABELS: Record<TaskKind, string> = {
  low_fuel: 'Fuel the reefer',
  unit_off: 'Unit off on a loaded reefer',
  doors_open: 'Close the doors',
  seal_missing: 'Seal missing on a loaded trailer',
};

/**
 * Yard tasks a scan calls for. Low fuel uses the terminal's policy; a unit off only matters on a
 * loaded reefer, and a missing seal on a loaded trailer (an empty one carries none: common practice).
 */
export function tasksForScan(
  scan: QuickChecks,
  trailer: { kind: 'reefer' | 'dry_van'; isLoaded: boolean },
  policy: YardPolicy,
): { kind: TaskKind; note: string }[] {
  const tasks: { kind: TaskKind; note: string }[] = [];
  if (trailer.kind === 'reefer' && scan.fuelEighths !== null && scan.fuelEighths <= policy.lowFuelEighths) {
    tasks.push({
      kind: 'low_fuel',
      note: `Fuel read ${scan.fuelEighths}/8 (policy: at or below ${policy.lowFuelEighths}/8).`,
    });
  }
  if (trailer.kind === 'reefer' && trailer.isLoaded && scan.isUnitRunning === false) {
    tasks.push({ kind: 'unit_off', note: 'Loaded reefer found with the unit not running.' });
  }
  if (scan.areDoorsClosed === false) tasks.push({ kind: 'doors_open', note: 'Doors found open.' });
  if (trailer.isLoaded && scan.isSealPresent === false)
    tasks.push({ kind: 'seal_missing', note: 'Loaded trailer found without a seal.' });
  return tasks;
}
