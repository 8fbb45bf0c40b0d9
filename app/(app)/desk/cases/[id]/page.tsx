import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { getLocale, getTranslations } from 'next-intl/server';
import { Caution } from '@/app/_components/caution';
import { getCaseEvidence, listCustodyRows } from '@/db/queries/case-evidence';
import { getCase, listCaseEvents } from '@/db/queries/cases';
import { proposalOf } from '@/lib/desk/case-proposal';
import { isWithinDisputeWindow } from '@/lib/desk/case-state';
import { custodyTimeline } from '@/lib/desk/custody';
import { isDeskStaff } from '@/lib/desk/access';
import { effectiveAmountCents } from '@/lib/desk/estimate';
import { itemZone } from '@/lib/desk/item-labels';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { readable, storedText } from '@/lib/i18n/reasons';
import { centsToDollarsInput, formatMoney } from '@/lib/format/money';
import { formatTime } from '@/lib/format/time';
import { requireUser } from '@/lib/server/auth';
import { CaseStateBadge } from '../../_components/case-state-badge';
import { CaseActions } from './_components/case-actions';
import { CaseHistory } from './_components/case-history';
import { CustodyTimeline } from './_components/custody-timeline';
import { EvidencePair } from './_components/evidence-pair';
import { TrailerDiagram } from './_components/trailer-diagram';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Case'))('title') };
}

export default async function CasePage({ params }: PageProps<'/desk/cases/[id]'>) {
  const user = await requireUser(SECTION_ROLES.desk);
  const { id } = (await params) as { id: string };
  if (!z.uuid().safeParse(id).success) notFound();
  const c = await getCase(id, user);
  if (!c) notFound();
  const [stored, events] = await Promise.all([getCaseEvidence(c), listCaseEvents(c.id)]);
  // stored findings and the attribution note in the reader's language (lib/i18n/reasons.ts)
  const locale = await getLocale();
  const evidence = { ...stored, findings: readable(stored.findings, locale, c.timeZone) };
  const note = c.attributionNote
    ? storedText(c.attributionNote, c.attributionNoteCode, c.attributionNoteParams, locale, c.timeZone)
    : null;
  const after = evidence.handoffs.find((h) => h.id === c.handoffId);
  const befores = evidence.handoffs.filter((h) => h.id !== c.handoffId).map((h) => h.occurredAt.getTime());
  const custody =
    after && befores.length
      ? custodyTimeline(await listCustodyRows(c.trailerId, new Date(Math.min(...befores)), after.occurredAt))
      : [];
  const amount = effectiveAmountCents(c);
  const isUnsafe = evidence.findings.some((f) => f.condition === 'unsafe');
  const tz = c.timeZone;
  const t = await getTranslations('Case');
  // the header says what the findings say: a carrier, the terminal, several parties or nobody yet
  const proposal = proposalOf(c.carrierName, evidence.findings);
  const proposalWords =
    proposal.kind === 'carrier'
      ? proposal.name
      : proposal.kind === 'terminal'
        ? t('proposedTerminal', { terminal: proposal.name })
        : proposal.kind === 'several'
          ? t('proposedSeveral', { names: new Intl.ListFormat(locale).format(proposal.names) })
          : t('proposedNone');
  const cautions = await getTranslations('Cautions');
  return (
    <div className="space-y-4">
      <p>
        <Link href="/desk" className="text-gate font-bold text-brand underline">
          {t('allCases')}
        </Link>
      </p>
      <header className="space-y-1">
        <h1 className="text-gate-xl font-bold">
          {t('trailer', { unit: c.unitNumber })} <CaseStateBadge state={c.state} />
        </h1>
        <p className="text-gate">
          {c.terminalName} ·{' '}
          {after
            ? t('handoffOn', {
                kind: t(`kind.${after.kind}`),
                when: formatTime(after.occurredAt, tz, 'dateTime', locale),
              })
            : ''}{' '}
          · {t('proposed')} <span className="font-bold">{proposalWords}</span>
        </p>
        {note ? <p className="text-gate font-bold text-warn">{t('marked', { note })}</p> : null}
        <p className="text-gate">
          {t('estimate')} <span className="font-bold">{formatMoney(amount)}</span>{' '}
          {c.overrideCents !== null
            ? t('setByClerk', { reason: c.overrideReason ?? '', rate: formatMoney(c.estimateCents) })
            : t('fromRateCard')}
          {c.decision
            ? ` · ${t('decided', {
                decision: t(`actions.decisionChoice.${c.decision}`),
                amount: formatMoney(c.chargedCents ?? 0),
              })}`
            : ''}
          {c.disputeDeadline
            ? ` · ${t('disputeUntil', { when: formatTime(c.disputeDeadline, tz, 'dateTime', locale) })}`
            : ''}
        </p>
        {isDeskStaff(user.role) ? (
          <Link
            href={`/trailers/${c.trailerId}`}
            className="inline-flex min-h-tap items-center text-gate-sm font-bold text-brand underline"
          >
            {t('trailerFile')}
          </Link>
        ) : null}
      </header>
      {isUnsafe ? (
        <Caution title={cautions('titles.outOfService')}>{cautions('outOfService')}</Caution>
      ) : null}
      <div className="grid gap-4 lg:grid-cols-[1fr_22rem]">
        <div className="space-y-4">
          <section aria-labelledby="evidence" className="space-y-3">
            <h2 id="evidence" className="text-gate-lg font-bold">
              {t('evidence')}
            </h2>
            {evidence.findings.map((f) => (
              <EvidencePair
                key={f.id}
                finding={f}
                evidence={evidence}
                afterHandoffId={c.handoffId}
                timeZone={tz}
              />
            ))}
          </section>
          <TrailerDiagram
            damagedZones={[...new Set(evidence.findings.map((f) => itemZone(f.itemKey)))]}
            isReefer={c.trailerKind === 'reefer'}
            axles={c.axleCount}
          />
          <section aria-labelledby="custody" className="space-y-2 rounded-xl bg-paper p-3">
            <h2 id="custody" className="text-gate-lg font-bold">
              {t('custody')}
            </h2>
            <CustodyTimeline events={custody} timeZone={tz} />
          </section>
        </div>
        <aside className="space-y-4">
          <CaseActions
            caseId={c.id}
            trailerId={c.trailerId}
            itemKey={evidence.findings[0]?.itemKey ?? 'left_side.skin'}
            state={c.state}
            role={user.role}
            carrierEmail={c.carrierEmail}
            amountDollars={centsToDollarsInput(amount)}
            isDisputeOpen={isWithinDisputeWindow(c.disputeDeadline, new Date())}
          />
          <section aria-labelledby="history">
            <h2 id="history" className="text-gate-lg font-bold">
              {t('history')}
            </h2>
            <CaseHistory events={events} timeZone={tz} />
          </section>
        </aside>
      </div>
    </div>
  );
}
