import type { Metadata } from 'next';
import Link from 'next/link';
import { getLocale, getTranslations } from 'next-intl/server';
import { EmptyState } from '@/app/_components/empty-state';
import { listCaseCarriers, listCases } from '@/db/queries/cases';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { isDeskStaff } from '@/lib/desk/access';
import { formatMoney } from '@/lib/format/money';
import { formatTime } from '@/lib/format/time';
import { requireUser } from '@/lib/server/auth';
import { refusalSayer } from '@/lib/server/i18n/say';
import { listFailedEmails } from '@/lib/server/jobs/mail-failures';
import { CASE_PAGE_SIZE, caseCursor, caseQueueQuerySchema } from '@/lib/validation/desk';
import { describeZodError } from '@/lib/validation/errors';
import { CaseStateBadge } from './_components/case-state-badge';
import { FailedMail } from './_components/failed-mail';
import { QueueFilters } from './_components/queue-filters';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Desk'))('title') };
}

const pick = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

export default async function DeskPage({ searchParams }: PageProps<'/desk'>) {
  const user = await requireUser(SECTION_ROLES.desk);
  const t = await getTranslations('Desk');
  const locale = await getLocale();
  const raw = Object.fromEntries(
    (Object.entries(await searchParams) as [string, string | string[] | undefined][]).map(([k, v]) => [
      k,
      pick(v),
    ]),
  );
  const parsed = caseQueueQuerySchema.safeParse(raw);
  const say = await refusalSayer();
  const errors = parsed.success
    ? {}
    : Object.fromEntries(
        Object.entries(describeZodError(parsed.error).fieldErrors).map(([k, list]) => [k, list.map(say)]),
      );
  const isStaff = isDeskStaff(user.role);
  const now = new Date();
  const [page, carriers, failedMail] = await Promise.all([
    parsed.success
      ? listCases(user, { ...parsed.data, now, limit: CASE_PAGE_SIZE + 1 })
      : Promise.resolve([]),
    isStaff ? listCaseCarriers() : Promise.resolve([]),
    isStaff ? listFailedEmails() : Promise.resolve([]),
  ]);
  const tz = user.terminalTimeZone ?? 'UTC';
  const rows = page.slice(0, CASE_PAGE_SIZE);
  // the time sorts page by keyset (the last case shown); the amount sorts show their first page only
  const sort = parsed.success ? parsed.data.sort : 'oldest';
  const last = rows.at(-1);
  const nextHref =
    page.length > CASE_PAGE_SIZE && last && (sort === 'oldest' || sort === 'newest')
      ? `/desk?${new URLSearchParams([
          ...Object.entries(raw).filter((e): e is [string, string] => e[0] !== 'after' && e[1] !== undefined),
          ['after', caseCursor(last)],
        ])}`
      : null;
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h1 className="text-gate-xl font-bold">
          {isStaff ? t('casesStaff') : t('casesCarrier', { carrier: user.carrierName ?? t('yourCarrier') })}
        </h1>
        {isStaff ? (
          <Link
            href="/desk/reports"
            className="inline-flex min-h-tap items-center text-gate font-bold text-brand underline"
          >
            {t('reports')}
          </Link>
        ) : null}
      </div>
      {isStaff ? <FailedMail emails={failedMail} timeZone={tz} /> : null}
      {isStaff ? (
        <QueueFilters carriers={carriers} values={raw as Record<string, string>} errors={errors} />
      ) : null}
      {!parsed.success ? (
        <p
          role="alert"
          className="rounded-lg border-2 border-danger bg-danger-bg p-3 text-gate font-bold text-danger"
        >
          {t('badFilters')}
        </p>
      ) : rows.length === 0 ? (
        <EmptyState title={t('noCases')}>{isStaff ? t('noMatch') : t('noCarrierCases')}</EmptyState>
      ) : (
        <ul className="divide-y divide-paper-line rounded-xl bg-paper" aria-label={t('casesLabel')}>
          {rows.map((c) => (
            <li key={c.id}>
              <Link
                href={`/desk/cases/${c.id}`}
                className="grid min-h-tap grid-cols-[1fr_auto] gap-x-3 gap-y-1 p-3 hover:bg-brand-light sm:grid-cols-[8rem_1fr_8rem_9rem_7rem]"
              >
                <span className="text-gate font-bold">{t('trailer', { unit: c.unitNumber })}</span>
                <span className="text-gate-sm text-ink-soft sm:order-none">
                  {c.carrierScac ?? t('noSingleCarrier')} · {c.terminalCode} · {t(`kind.${c.handoffKind}`)}
                </span>
                <span className="text-gate font-bold">
                  {formatMoney(c.amountCents)}
                  {c.isOverridden ? <span className="text-gate-sm text-ink-soft"> {t('set')}</span> : null}
                </span>
                <span className="text-gate-sm">
                  {t('opened', { when: formatTime(c.openedAt, tz, 'dateTime', locale) })}
                </span>
                <span>
                  <CaseStateBadge state={c.state} />
                </span>
              </Link>
            </li>
          ))}
        </ul>
      )}
      {nextHref ? (
        <Link href={nextHref} className="inline-block min-h-tap text-gate font-bold text-brand underline">
          {t('next', { count: CASE_PAGE_SIZE })}
        </Link>
      ) : null}
    </div>
  );
}
