import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { getLocale, getTranslations } from 'next-intl/server';
import { listCaseFindings } from '@/db/queries/case-evidence';
import { getCase } from '@/db/queries/cases';
import { verifyCaseLink } from '@/lib/desk/case-link';
import { isWithinDisputeWindow } from '@/lib/desk/case-state';
import { effectiveAmountCents } from '@/lib/desk/estimate';
import { itemLabel } from '@/lib/desk/item-labels';
import { itemLabel as itemWords } from '@/lib/i18n/checklist';
import { formatMoney } from '@/lib/format/money';
import { formatTime } from '@/lib/format/time';
import { caseLinkSecret } from '@/lib/server/env';
import { LinkDisputeForm } from './link-dispute-form';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('CaseLink'))('title'), robots: { index: false } };
}

// Public: the signed token is the permission. It shows the evidence summary of one case to the
// carrier named in the token, and takes a dispute while the window is open. Photos stay behind
// sign-in (the carrier's drivers see them on the desk).
export default async function CaseLinkPage({ params }: PageProps<'/case-link/[token]'>) {
  const { token } = (await params) as { token: string };
  const link = verifyCaseLink(decodeURIComponent(token), caseLinkSecret(), new Date());
  if (!link.ok) notFound();
  const c = await getCase(link.claims.caseId, { role: 'driver', carrierId: link.claims.carrierId });
  if (!c) notFound();
  const findings = await listCaseFindings(c);
  const t = await getTranslations('CaseLink');
  const locale = await getLocale();
  const desk = await getTranslations('Desk');
  const condition = await getTranslations('Reasons.condition');
  const isOpen = c.state === 'notified' && isWithinDisputeWindow(c.disputeDeadline, new Date());
  return (
    <main className="mx-auto max-w-3xl space-y-4 p-4">
      <p className="text-gate-lg font-bold text-brand">Hitchmark</p>
      <h1 className="text-gate-xl font-bold">{t('heading', { unit: c.unitNumber })}</h1>
      <p className="text-gate">
        {c.carrierName} · {c.terminalName} · {t('state')}{' '}
        <span className="font-bold">{desk(`state.${c.state}`)}</span> · {t('estimate')}{' '}
        <span className="font-bold">{formatMoney(effectiveAmountCents(c))}</span>
        {c.disputeDeadline
          ? ` · ${t('disputeUntil', { when: formatTime(c.disputeDeadline, c.timeZone, 'dateTime', locale) })}`
          : ''}
      </p>
      <ul className="space-y-2">
        {findings.map((f) => (
          <li key={f.id} className="rounded-xl bg-paper p-3">
            <p className="text-gate font-bold">
              {itemWords(locale, f.itemKey, itemLabel(f.itemKey))}:{' '}
              {f.previousCondition ? condition(f.previousCondition) : t('noEarlier')} →{' '}
              {f.condition ? condition(f.condition) : t('notChecked')}
            </p>
            <p className="text-gate-sm" data-stored-text="">
              {f.reason}
            </p>
          </li>
        ))}
      </ul>
      {isOpen ? (
        <LinkDisputeForm token={decodeURIComponent(token)} />
      ) : (
        <p className="text-gate">{t('closed', { state: desk(`state.${c.state}`) })}</p>
      )}
    </main>
  );
}
