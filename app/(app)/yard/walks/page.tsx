import type { Metadata } from 'next';
import Link from 'next/link';
import { ActionForm } from '@/app/_components/action-form';
import { getLocale, getTranslations } from 'next-intl/server';
import { Caution } from '@/app/_components/caution';
import { EmptyState } from '@/app/_components/empty-state';
import { listLayout } from '@/db/queries/yard-layout';
import { listRecentWalks } from '@/db/queries/yard-walks';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { formatTime } from '@/lib/format/time';
import { YardNav } from '../_components/yard-nav';
import { RowChoice } from './_components/row-choice';
import { startWalkAction } from './actions';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Walk'))('title') };
}

export default async function WalksPage() {
  const user = await requireUser(SECTION_ROLES.yard);
  const t = await getTranslations('Walk');
  const locale = await getLocale();
  const y = await getTranslations('Yard');
  const c = await getTranslations('Cautions');
  if (!user.terminalId) return <EmptyState title={y('noTerminal')}>{y('askAdmin')}</EmptyState>;
  const [{ rows }, walks] = await Promise.all([
    listLayout(user.terminalId),
    listRecentWalks(user.terminalId),
  ]);
  const tz = user.terminalTimeZone ?? 'UTC';
  return (
    <div className="space-y-4">
      <YardNav current="/yard/walks" />
      <h1 className="text-gate-xl font-bold">{t('title')}</h1>
      <Caution title={c('titles.yardWalk')}>{c('yardWalk')}</Caution>
      <section aria-labelledby="start-title" className="rounded-xl bg-paper p-4 shadow">
        <h2 id="start-title" className="text-gate-lg font-bold">
          {t('start')}
        </h2>
        <ActionForm action={startWalkAction} submitLabel={t('startSubmit')} pendingLabel={t('starting')}>
          <RowChoice rows={rows} />
        </ActionForm>
      </section>
      <section aria-labelledby="recent-title">
        <h2 id="recent-title" className="text-gate-lg font-bold">
          {t('recent')}
        </h2>
        {walks.length === 0 ? (
          <p className="text-gate">{t('none')}</p>
        ) : (
          <ul className="space-y-1">
            {walks.map((w) => (
              <li key={w.id}>
                <Link
                  href={`/yard/walks/${w.id}`}
                  className="flex min-h-tap items-center gap-2 rounded-lg bg-paper px-3 text-gate underline"
                >
                  {formatTime(w.startedAt, tz, 'dateTime', locale)} · {w.startedBy} ·{' '}
                  {w.status === 'finished' ? t('finished') : t('inProgress')}
                  {w.summary
                    ? ` · ${t('summary', {
                        matched: w.summary.matched ?? 0,
                        wrongSlot: w.summary.wrong_slot ?? 0,
                        missing: w.summary.missing ?? 0,
                        unknown: w.summary.unknown ?? 0,
                      })}`
                    : ''}
                </Link>
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
