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

export const TASK_KINDS = ['low_fuel', 'unit_off', 'doors_open', 'seal_missing'] as const;
export type TaskKind = (typeof TASK_KINDS)[number];

/** What the clerk or jockey did about a walk outcome. */
export const WALK_RESOLUTIONS = ['accepted', 'marked_gone', 'investigating'] as const;
export type WalkResolution = (typeof WALK_RESOLUTIONS)[number];

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

/** A walk scan with what is known of the trailer it named (nothing for an unknown text). */
export interface ScanOfTrailer extends QuickChecks {
  trailerId: string | null;
  kind: 'reefer' | 'dry_van' | null;
  isLoaded: boolean | null;
}

export type NewTask = { trailerId: string; kind: TaskKind; note: string };

/**
 * The tasks a finished walk adds. Scans come in walking order and the latest scan of a trailer
 * decides (a later look overrides an earlier one); a task already open for the trailer is not
 * added again.
 */
export function tasksForWalk(
  scans: readonly ScanOfTrailer[],
  openTasks: readonly { trailerId: string; kind: TaskKind }[],
  policy: YardPolicy,
): NewTask[] {
  const seen = new Set(openTasks.map((o) => `${o.trailerId}:${o.kind}`));
  const latest = new Map<string, ScanOfTrailer & { trailerId: string }>();
  for (const s of scans)
    if (s.trailerId !== null && s.kind !== null) latest.set(s.trailerId, { ...s, trailerId: s.trailerId });
  const tasks: NewTask[] = [];
  for (const s of latest.values()) {
    const trailer = { kind: s.kind!, isLoaded: s.isLoaded ?? false };
    for (const task of tasksForScan(s, trailer, policy)) {
      const key = `${s.trailerId}:${task.kind}`;
      if (seen.has(key)) continue;
      seen.add(key);
      tasks.push({ trailerId: s.trailerId, ...task });
    }
  }
  return tasks;
}
