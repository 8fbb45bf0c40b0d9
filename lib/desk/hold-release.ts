// When a recorded repair may release a hold. Pure: the caller passes the hold, the repair time and now.

export type RepairTimeProblem = 'repair_in_future' | 'repair_before_hold';

/** A minute of slack for a clock that runs a little ahead of the server's. */
const CLOCK_SLACK_MS = 60_000;

/** Why the repair time cannot be right, or null when it can: not in the future, not before the hold. */
export function repairTimeProblem(repairedAt: Date, placedAt: Date, now: Date): RepairTimeProblem | null {
  if (repairedAt.getTime() > now.getTime() + CLOCK_SLACK_MS) return 'repair_in_future';
  if (repairedAt.getTime() < placedAt.getTime()) return 'repair_before_hold';
  return null;
}

export const REPAIR_TIME_WORDS: Record<RepairTimeProblem, string> = {
  repair_in_future: 'The repair time is in the future.',
  repair_before_hold: 'The repair time is before the hold was placed.',
};
