// The time a jockey made a move, as the phone says it: a move queued without signal is recorded
// at the time it was made, not when it reached the server. Pure: callers pass `now`.

/** A phone clock may run a little ahead of the server's; more than this is refused. */
export const MOVE_CLOCK_SKEW_MS = 2 * 60_000;
/**
 * A queued move older than this is refused: 72 h covers a long weekend without signal, and a
 * move older than that says more about a lost phone than about where the trailer stands now.
 */
export const MOVE_MAX_AGE_MS = 72 * 3_600_000;

export const MOVE_IN_FUTURE =
  'The time of the move is ahead of the terminal’s clock. Check the phone’s clock.';
export const MOVE_TOO_OLD =
  'The move was made more than 72 hours ago. Record it again with where the trailer is now.';

/** Why `madeAt` cannot be the move's time at `now`, or null when it can. */
export function madeAtProblem(madeAt: Date, now: Date): string | null {
  const ahead = madeAt.getTime() - now.getTime();
  if (ahead > MOVE_CLOCK_SKEW_MS) return MOVE_IN_FUTURE;
  if (-ahead > MOVE_MAX_AGE_MS) return MOVE_TOO_OLD;
  return null;
}
