import { useLocale, useTranslations } from 'next-intl';
import { formatTime } from '@/lib/format/time';
import type { PhotoCheckReport } from '@/lib/server/photos/integrity';

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
  const t = useTranslations('Trailers');
  const locale = useLocale();
  const bad = result && result !== 'unavailable' ? result.counts.changed + result.counts.missing : 0;
  return (
    <section aria-labelledby="photo-check" className="space-y-2 rounded-lg bg-paper p-3">
      <h2 id="photo-check" className="text-gate-lg font-bold">
        {t('photos.title')}
      </h2>
      <form action={`/trailers/${trailerId}`} method="get">
        {kind ? <input type="hidden" name="kind" value={kind} /> : null}
        <input type="hidden" name="photos" value="check" />
        <button
          type="submit"
          className="min-h-tap rounded-lg border-2 border-brand px-4 text-gate-sm font-bold text-brand"
        >
          {t('photos.check')}
        </button>
      </form>
      {result === 'unavailable' ? (
        <p role="alert" className="text-gate font-bold text-danger">
          {t('photos.unavailable')}
        </p>
      ) : result ? (
        <>
          <p
            role={bad ? 'alert' : 'status'}
            className={`text-gate font-bold ${bad ? 'text-danger' : 'text-ok'}`}
          >
            {result.photos.length === 0
              ? t('photos.none')
              : t('photos.summary', { matches: result.counts.matches, total: result.photos.length }) +
                (result.counts.changed
                  ? `; ${t('photos.changedCount', { count: result.counts.changed })}`
                  : '') +
                (result.counts.missing
                  ? `; ${t('photos.missingCount', { count: result.counts.missing })}`
                  : '') +
                '.'}
          </p>
          <ul aria-label={t('photos.label')} className="space-y-1">
            {result.photos.map((p) => (
              <li key={p.id} data-outcome={p.outcome} className="text-gate-sm">
                {formatTime(p.occurredAt, timeZone, 'dateTime', locale)} · {p.handoffKind} ·{' '}
                {p.itemKey ?? t('photos.photo')}:{' '}
                <a href={`/api/photos/${p.id}`} className="text-brand underline">
                  {t('photos.photo')}
                </a>{' '}
                <span className={p.outcome === 'matches' ? 'text-ok' : 'font-bold text-danger'}>
                  {t(`photos.says.${p.outcome}`)}
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
