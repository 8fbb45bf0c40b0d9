import { formatTime } from '@/lib/format/time';
import type { ChainCheck } from '@/lib/handoffs/hash';

/** Whether the trailer's handoff records still hash to what was stored when they were made. */
export function ChainStatus({
  check,
  brokenAt,
  timeZone,
}: {
  check: ChainCheck;
  brokenAt: Date | null;
  timeZone: string;
}) {
  if (check.ok) {
    return (
      <p role="status" className="rounded-lg border-l-8 border-ok bg-ok-bg p-3 text-gate font-bold text-ok">
        Chain verifies: {check.count} {check.count === 1 ? 'record' : 'records'}
      </p>
    );
  }
  return (
    <p
      role="alert"
      className="rounded-lg border-l-8 border-danger bg-danger-bg p-3 text-gate font-bold text-danger"
    >
      {check.why === 'unkeyed' ? (
        <>
          Record of {brokenAt ? formatTime(brokenAt, timeZone) : 'an unknown date'} is linked without the
          chain key, so Hitchmark cannot vouch for it. It and every later record are unproven.
        </>
      ) : (
        <>
          Record of {brokenAt ? formatTime(brokenAt, timeZone) : 'an unknown date'} changed after the fact
          {check.why === 'link_broken' ? ' (its link to the record before it is broken)' : ''}. Every later
          record is unproven.
        </>
      )}
    </p>
  );
}
