import { formatTime } from '@/lib/format/time';
import type { PhotoCheckReport } from '@/lib/server/photos/integrity';

const SAYS = {
  matches: 'matches the record',
  changed: 'CHANGED since it was recorded',
  missing: 'MISSING from storage',
} as const;

/**
 * "Check the photos": a GET button (it only reads) that re-hashes each recorded photo of the
 * trailer, and the per-photo outcome once it has run.
 */
export function PhotoCheckPanel({
  trailerId,
  kind,
  result,
  timeZone,
}: {
  trailerId: string;
  kind?: string;
  result: PhotoCheckReport | 'unavailable' | null;
  timeZone: string;
}) {
  const bad = result && result !== 'unavailable' ? result.counts.changed + result.counts.missing : 0;
  return (
    <section aria-labelledby="photo-check" className="space-y-2 rounded-lg bg-paper p-3">
      <h2 id="photo-check" className="text-gate-lg font-bold">
        Photos
      </h2>
      <form action={`/trailers/${trailerId}`} method="get">
        {kind ? <input type="hidden" name="kind" value={kind} /> : null}
        <input type="hidden" name="photos" value="check" />
        <button
          type="submit"
          className="min-h-tap rounded-lg border-2 border-brand px-4 text-gate-sm font-bold text-brand"
        >
          Check the photos
        </button>
      </form>
      {result === 'unavailable' ? (
        <p role="alert" className="text-gate font-bold text-danger">
          Photo storage did not answer; nothing was checked. Try again in a minute.
        </p>
      ) : result ? (
        <>
          <p
            role={bad ? 'alert' : 'status'}
            className={`text-gate font-bold ${bad ? 'text-danger' : 'text-ok'}`}
          >
            {result.photos.length === 0
              ? 'No recorded photos for this trailer.'
              : `${result.counts.matches} of ${result.photos.length} photos match the record` +
                (result.counts.changed ? `; ${result.counts.changed} changed` : '') +
                (result.counts.missing ? `; ${result.counts.missing} missing` : '') +
                '.'}
          </p>
          <ul aria-label="Photo check" className="space-y-1">
            {result.photos.map((p) => (
              <li key={p.id} data-outcome={p.outcome} className="text-gate-sm">
                {formatTime(p.occurredAt, timeZone)} · {p.handoffKind} · {p.itemKey ?? 'photo'}:{' '}
                <a href={`/api/photos/${p.id}`} className="text-brand underline">
                  photo
                </a>{' '}
                <span className={p.outcome === 'matches' ? 'text-ok' : 'font-bold text-danger'}>
                  {SAYS[p.outcome]}
                </span>{' '}
                <span className="font-mono text-ink-soft">sha-256 {p.sha256.slice(0, 12)}…</span>
              </li>
            ))}
          </ul>
        </>
      ) : null}
    </section>
  );
}
