import type { Metadata } from 'next';
import { getLocale, getTranslations } from 'next-intl/server';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { Caution } from '@/app/_components/caution';
import { getTrailerFileRows, getTrailerHeader } from '@/db/queries/trailer-file';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { isDeskStaff } from '@/lib/desk/access';
import { findingTitle } from '@/lib/desk/finding-title';
import { buildTrailerFile, STORED, type FileWords } from '@/lib/desk/trailer-file';
import { itemLabel } from '@/lib/i18n/checklist';
import { readable } from '@/lib/i18n/reasons';
import { formatTime, toLocalInput } from '@/lib/format/time';
import { requireUser } from '@/lib/server/auth';
import { verifyTrailerChain } from '@/lib/server/handoffs/chain';
import { checkTrailerPhotos, type PhotoCheckReport } from '@/lib/server/photos/integrity';
import { fileCursorParam, TRAILER_FILE_KINDS, trailerFileQuerySchema } from '@/lib/validation/desk';
import { ChainStatus } from './_components/chain-status';
import { HoldReleaseForm } from './_components/hold-release-form';
import { PhotoCheckPanel } from './_components/photo-check';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Trailers'))('file.title') };
}

/** The photo check, or `unavailable` when storage does not answer (the file itself still shows). */
async function tryCheckPhotos(trailerId: string): Promise<PhotoCheckReport | 'unavailable'> {
  try {
    return await checkTrailerPhotos(trailerId);
  } catch (error) {
    console.error('[photos] check failed', error);
    return 'unavailable';
  }
}

const TONES = { danger: 'border-danger', ok: 'border-ok', hold: 'border-hold' } as const;

export default async function TrailerFilePage({ params, searchParams }: PageProps<'/trailers/[id]'>) {
  const user = await requireUser(SECTION_ROLES.trailers);
  const { id } = (await params) as { id: string };
  if (!z.uuid().safeParse(id).success) notFound();
  const query = trailerFileQuerySchema.safeParse(await searchParams);
  const kind = query.success ? query.data.kind : undefined;
  const badPage = !query.success && query.error.issues.some((i) => i.path[0] === 'before');
  const trailer = await getTrailerHeader(id);
  if (!trailer) notFound();
  const tp = await getTranslations('TrailerFilePages');
  // the whole chain is re-hashed only when asked for: it reads every handoff and item of the trailer
  const wantsChain = query.success && query.data.chain === 'check';
  const [page, chain] = await Promise.all([
    getTrailerFileRows(id, query.success ? (query.data.before ?? null) : null),
    wantsChain ? verifyTrailerChain(id) : null,
  ]);
  const stored = page.rows;
  const photoCheck = query.success && query.data.photos === 'check' ? await tryCheckPhotos(id) : null;
  const zone = trailer.timeZone ?? user.terminalTimeZone ?? 'UTC';
  // stored findings and holds in the reader's language (lib/i18n/reasons.ts)
  const locale = await getLocale();
  const rows = {
    ...stored,
    findings: readable(stored.findings, locale, zone),
    holds: readable(stored.holds, locale, zone),
  };
  const tph = await getTranslations('Photos');
  const entries = buildTrailerFile(rows, kind, page.window);
  const openHolds = rows.holds.filter((h) => !h.releasedAt);
  const linkTo = (extra: Record<string, string>) => {
    const p = new URLSearchParams({ ...(kind ? { kind } : {}), ...extra });
    return p.size ? `/trailers/${id}?${p}` : `/trailers/${id}`;
  };
  const canRelease = isDeskStaff(user.role);
  const nowLocal = toLocalInput(new Date(), zone);
  const t = await getTranslations('Trailers');
  const c = await getTranslations('Cautions');
  const desk = await getTranslations('Desk');
  // a file line in the reader's language; stored text (engine reasons, notes) shown as it is
  const say = (w: FileWords) => {
    if (w.key === STORED) return <span data-stored-text="">{w.values.text}</span>;
    if (w.key === 'finding')
      return findingTitle(
        { kind: w.values.kind, itemKey: w.values.item, condition: w.values.condition || null },
        locale,
      );
    // the item in the reader's language (the Checklist catalogue), the recorded label when it has none
    if (w.key === 'photoOf' && w.values.itemKey)
      return t('file.entry.photoOf', { item: itemLabel(locale, w.values.itemKey, w.values.item) });
    if (w.key === 'case') {
      const state = desk.has(`state.${w.values.state}` as 'state.open')
        ? desk(`state.${w.values.state}` as 'state.open')
        : w.values.state;
      return w.values.scac
        ? t('file.entry.caseScac', { state, scac: w.values.scac })
        : t('file.entry.case', { state });
    }
    return t(`file.entry.${w.key}` as 'file.entry.moved', w.values);
  };
  return (
    <div className="space-y-4">
      <header>
        <h1 className="text-gate-xl font-bold">{t('file.heading', { unit: trailer.unitNumber })}</h1>
        <p className="text-gate">
          {t(`kind.${trailer.kind}`)} · {trailer.ownerScac} · <span className="font-mono">{trailer.vin}</span>{' '}
          ·{' '}
          {trailer.status === 'in_yard'
            ? `${trailer.terminalName} ${trailer.spotLabel ?? ''}`
            : trailer.status === 'on_road'
              ? t('file.onRoad')
              : t('file.gone')}
        </p>
      </header>
      {chain ? (
        <ChainStatus check={chain.check} brokenAt={chain.brokenAt} timeZone={zone} />
      ) : (
        <p className="flex flex-wrap items-center gap-3 rounded-lg border-l-8 border-paper-line bg-paper p-3 text-gate">
          {tp('chainNotChecked')}
          <Link
            href={linkTo({ chain: 'check' })}
            className="inline-flex min-h-tap items-center rounded-full border-2 border-brand px-4 text-gate-sm font-bold text-brand"
          >
            {tp('checkChain')}
          </Link>
        </p>
      )}
      <PhotoCheckPanel trailerId={trailer.id} kind={kind} result={photoCheck} timeZone={zone} />
      {openHolds.length ? (
        <section aria-labelledby="holds" className="space-y-3 rounded-xl bg-hold-bg p-3">
          <h2 id="holds" className="text-gate-lg font-bold text-hold">
            {t('file.openHolds')}
          </h2>
          <Caution title={t('file.beforeRepair')}>
            {c('underTrailer')} {c('outOfService')} {c('inspection')}
          </Caution>
          {openHolds.map((h) => (
            <div key={h.id} className="space-y-2 rounded-lg bg-paper p-3">
              <p className="text-gate font-bold">
                {h.severity === 'out_of_service' ? t('file.outOfService') : t('file.restricted')}:{' '}
                <span data-stored-text="">{h.reason}</span>
              </p>
              <p className="text-gate-sm text-ink-soft">
                {t('file.placed', { when: formatTime(h.placedAt, zone, 'dateTime', locale) })}
              </p>
              {canRelease ? (
                <HoldReleaseForm holdId={h.id} trailerId={trailer.id} reason={h.reason} nowLocal={nowLocal} />
              ) : null}
            </div>
          ))}
        </section>
      ) : null}
      <nav aria-label={t('file.filter')} className="flex flex-wrap gap-2">
        {[undefined, ...TRAILER_FILE_KINDS].map((k) => (
          <Link
            key={k ?? 'all'}
            href={k ? `/trailers/${id}?kind=${k}` : `/trailers/${id}`}
            aria-current={kind === k ? 'page' : undefined}
            className="inline-flex min-h-tap items-center rounded-full border-2 border-brand px-4 text-gate-sm font-bold text-brand aria-[current=page]:bg-brand aria-[current=page]:text-on-fill"
          >
            {k ? t(`file.kinds.${k}`) : t('file.everything')}
          </Link>
        ))}
      </nav>
      {!query.success ? (
        <p role="alert" className="text-gate font-bold text-danger">
          {badPage ? tp('badPage') : t('file.badFilter')}
        </p>
      ) : null}
      <p className="text-gate-sm text-ink-soft">{tp('pageNote', { count: rows.handoffs.length })}</p>
      <ol className="space-y-2" aria-label={t('file.history')}>
        {entries.map((e) => (
          <li
            key={e.id}
            className={`rounded-lg border-l-8 bg-paper p-3 ${e.tone ? TONES[e.tone] : 'border-paper-line'}`}
            data-kind={e.kind}
          >
            <p className="text-gate-sm text-ink-soft">
              {formatTime(e.at, zone, 'dateTime', locale)} · {t(`file.kindOne.${e.kind}`)}
            </p>
            <p className="text-gate font-bold">
              {e.href ? (
                <Link href={e.href} className="text-brand underline">
                  {say(e.words.title)}
                </Link>
              ) : (
                say(e.words.title)
              )}
            </p>
            {e.words.detail.length ? (
              <p className="text-gate-sm">
                {e.words.detail.map((w, i) => (
                  <span key={i}>
                    {i ? ' · ' : ''}
                    {say(w)}
                  </span>
                ))}
              </p>
            ) : null}
            {e.photoTimes ? (
              <p className="text-gate-sm" data-testid="photo-times">
                {e.photoTimes.takenAt
                  ? tph('taken', { time: formatTime(e.photoTimes.takenAt, zone, 'dateTime', locale) })
                  : tph('noCaptureTime')}{' '}
                · {tph('uploaded', { time: formatTime(e.photoTimes.uploadedAt, zone, 'dateTime', locale) })}
              </p>
            ) : null}
          </li>
        ))}
        {entries.length === 0 ? <li className="text-gate text-ink-soft">{t('file.nothing')}</li> : null}
      </ol>
      <nav aria-label={tp('older')} className="flex flex-wrap gap-2">
        {page.window.before ? (
          <Link
            href={linkTo({})}
            className="inline-flex min-h-tap items-center px-2 text-gate text-brand underline"
          >
            {tp('newest')}
          </Link>
        ) : null}
        {page.next ? (
          <Link
            href={linkTo({ before: fileCursorParam(page.next) })}
            className="inline-flex min-h-tap items-center rounded-full border-2 border-brand px-4 text-gate font-bold text-brand"
          >
            {tp('older')}
          </Link>
        ) : null}
      </nav>
    </div>
  );
}
