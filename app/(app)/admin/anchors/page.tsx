import type { Metadata } from 'next';
import Link from 'next/link';
import { getLocale, getTranslations } from 'next-intl/server';
import { EmptyState } from '@/app/_components/empty-state';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { formatTime } from '@/lib/format/time';
import { requireUser } from '@/lib/server/auth';
import { checkTerminalAnchors } from '@/lib/server/jobs/anchor';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Admin'))('anchors.title') };
}

/**
 * The terminal's daily anchors (newest first), each checked against the records as stored now.
 * The digest here must equal the one in the e-mail the manager received for that day.
 */
export default async function AnchorsPage() {
  const user = await requireUser(SECTION_ROLES.admin);
  const zone = user.terminalTimeZone ?? 'UTC';
  const anchors = user.terminalId ? await checkTerminalAnchors(user.terminalId) : [];
  const t = await getTranslations('Admin');
  const locale = await getLocale();
  return (
    <div className="space-y-4">
      <h1 className="text-gate-xl font-bold">
        {t('anchors.heading', { terminal: user.terminalName ?? t('anchors.noTerminal') })}
      </h1>
      <p className="text-gate">{t('anchors.intro')}</p>
      {anchors.length === 0 ? (
        <EmptyState title={t('anchors.none')}>{t('anchors.noneText')}</EmptyState>
      ) : (
        <ul className="space-y-2" aria-label={t('anchors.list')}>
          {anchors.map((a) => (
            <li
              key={a.id}
              data-day={a.day}
              className={`rounded-lg border-l-8 bg-paper p-3 ${a.check.ok ? 'border-ok' : 'border-danger'}`}
            >
              <p className="text-gate font-bold">
                {t('anchors.line', { day: a.day, trailers: a.heads.length, records: a.recordCount })}
              </p>
              <p className="break-all font-mono text-gate-sm">{a.digest}</p>
              <p className="text-gate-sm text-ink-soft">
                {t('anchors.anchored', {
                  when: formatTime(a.createdAt, zone, 'dateTime', locale),
                  to: a.emailedTo.length ? a.emailedTo.join(', ') : t('anchors.nobody'),
                })}
              </p>
              {a.check.ok ? (
                <p role="status" className="text-gate font-bold text-ok">
                  {t('anchors.ok')}
                </p>
              ) : (
                <div role="alert" className="text-gate font-bold text-danger">
                  <p>{a.check.digestMatches ? t('anchors.bad') : t('anchors.badDigest')}</p>
                  <ul className="list-disc pl-6 text-gate-sm">
                    {a.check.problems.map((p) => (
                      <li key={p.trailerId}>
                        {t('anchors.trailer')}{' '}
                        <Link href={`/trailers/${p.trailerId}`} className="underline">
                          {p.trailerId.slice(0, 8)}
                        </Link>
                        : {t(`anchors.why.${p.why}`)}
                      </li>
                    ))}
                  </ul>
                </div>
              )}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
