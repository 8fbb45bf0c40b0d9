// The words of the case e-mails, in the carrier contact's language. Pure: the caller passes every
// fact, the time zone, the language and the link.
import type { Condition } from '@/lib/engine';
import { formatMoney } from '@/lib/format/money';
import { formatTime } from '@/lib/format/time';
import type { Locale } from '@/lib/i18n/locales';
import { itemLabel as itemWords } from '@/lib/i18n/checklist';
import { storedText } from '@/lib/i18n/reasons';
import { translatorFor, writingLocale } from '@/lib/i18n/translate';
import type { Decision } from './case-state';
import { itemLabel } from './item-labels';

export type CaseEmailFacts = {
  locale: Locale;
  unitNumber: string;
  terminalName: string;
  carrierName: string;
  timeZone: string;
  handoffAt: Date;
  amountCents: number;
  items: { label: string; before: string | null; after: string | null; reason: string }[];
};

type CaseHeader = {
  unitNumber: string;
  terminalName: string;
  carrierName: string | null;
  timeZone: string;
  occurredAt: Date;
};
type FindingRow = {
  itemKey: string;
  previousCondition: Condition | null;
  condition: Condition | null;
  reason: string;
  reasonCode?: string | null;
  reasonParams?: unknown;
};

/** The facts both e-mails tell, from the case's header row and its findings, in `locale`. */
export function caseEmailFacts(
  c: CaseHeader,
  findings: FindingRow[],
  amountCents: number,
  locale: string | null = 'en',
): CaseEmailFacts {
  const lang = writingLocale(locale);
  const t = translatorFor(lang, 'Mail');
  const condition = (v: Condition | null) => (v ? t(`condition.${v}`) : null);
  return {
    locale: lang,
    unitNumber: c.unitNumber,
    terminalName: c.terminalName,
    carrierName: c.carrierName ?? t('case.carrier'),
    timeZone: c.timeZone,
    handoffAt: c.occurredAt,
    amountCents,
    items: findings.map((f) => ({
      label: itemWords(lang, f.itemKey, itemLabel(f.itemKey)),
      before: condition(f.previousCondition),
      after: condition(f.condition),
      reason: storedText(f.reason, f.reasonCode, f.reasonParams, lang, c.timeZone),
    })),
  };
}

const when = (f: CaseEmailFacts, at: Date) => formatTime(at, f.timeZone, 'dateTime', f.locale);

function itemLines(f: CaseEmailFacts) {
  const t = translatorFor(f.locale, 'Mail');
  return f.items
    .map(
      (i) =>
        `${t('case.item', { label: i.label, before: i.before ?? t('case.noEarlier'), after: i.after ?? t('case.notChecked') })}\n  ${i.reason}`,
    )
    .join('\n');
}

export function notifyEmail(f: CaseEmailFacts, deadline: Date, link: string) {
  const t = translatorFor(f.locale, 'Mail');
  const place = { unit: f.unitNumber, terminal: f.terminalName };
  return {
    subject: t('case.notifySubject', place),
    text: [
      t('case.greeting', { carrier: f.carrierName }),
      '',
      t('case.notifyRecorded', { ...place, when: when(f, f.handoffAt) }),
      t('case.notifyCompared'),
      '',
      itemLines(f),
      '',
      t('case.estimate', { amount: formatMoney(f.amountCents) }),
      t('case.disputeUntil', { when: when(f, deadline), zone: f.timeZone }),
      t('case.link', { link }),
      '',
      t('case.signature'),
    ].join('\n'),
  };
}

export function decisionEmail(f: CaseEmailFacts, decision: Decision, chargedCents: number, reason: string) {
  const t = translatorFor(f.locale, 'Mail');
  const amount = formatMoney(f.amountCents);
  return {
    subject: t('case.decisionSubject', { unit: f.unitNumber }),
    text: [
      t('case.greeting', { carrier: f.carrierName }),
      '',
      t('case.decided', {
        unit: f.unitNumber,
        terminal: f.terminalName,
        when: when(f, f.handoffAt),
        decision: t(`case.decision.${decision}`),
      }),
      t('case.charged', { amount, charged: formatMoney(chargedCents) }),
      t('case.reason', { reason }),
      '',
      itemLines(f),
      '',
      t('case.signature'),
    ].join('\n'),
  };
}
