// The words of the case e-mails. Pure: the caller passes every fact, the time zone and the link.
import { CONDITION_LABELS, type Condition } from '@/lib/engine';
import { formatMoney } from '@/lib/format/money';
import { formatTime } from '@/lib/format/time';
import type { Decision } from './case-state';
import { itemLabel } from './item-labels';

export type CaseEmailFacts = {
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
};

/** The facts both e-mails tell, from the case's header row and its findings. */
export function caseEmailFacts(c: CaseHeader, findings: FindingRow[], amountCents: number): CaseEmailFacts {
  return {
    unitNumber: c.unitNumber,
    terminalName: c.terminalName,
    carrierName: c.carrierName ?? 'Carrier',
    timeZone: c.timeZone,
    handoffAt: c.occurredAt,
    amountCents,
    items: findings.map((f) => ({
      label: itemLabel(f.itemKey),
      before: f.previousCondition ? CONDITION_LABELS[f.previousCondition] : null,
      after: f.condition ? CONDITION_LABELS[f.condition] : null,
      reason: f.reason,
    })),
  };
}

const DECISION_WORDS: Record<Decision, string> = {
  charge: 'charged to your company',
  share: 'shared: part of the repair is charged to your company',
  absorb: 'absorbed by the terminal: nothing is charged to your company',
  waive: 'waived: nothing is charged',
};

function itemLines(f: CaseEmailFacts) {
  return f.items
    .map(
      (i) => `- ${i.label}: ${i.before ?? 'no earlier record'} → ${i.after ?? 'not checked'}\n  ${i.reason}`,
    )
    .join('\n');
}

export function notifyEmail(f: CaseEmailFacts, deadline: Date, link: string) {
  return {
    subject: `Damage case for trailer ${f.unitNumber} at ${f.terminalName}`,
    text: [
      `${f.carrierName},`,
      '',
      `Trailer ${f.unitNumber} was recorded with new damage at ${f.terminalName} on ${formatTime(f.handoffAt, f.timeZone)}.`,
      'Hitchmark compared the handoff with the earlier record of each item:',
      '',
      itemLines(f),
      '',
      `Repair estimate: ${formatMoney(f.amountCents)}.`,
      `You may dispute this case with a note until ${formatTime(deadline, f.timeZone)} (${f.timeZone}).`,
      `Evidence and dispute form: ${link}`,
      '',
      'Hitchmark',
    ].join('\n'),
  };
}

export function decisionEmail(f: CaseEmailFacts, decision: Decision, chargedCents: number, reason: string) {
  return {
    subject: `Decision on the damage case for trailer ${f.unitNumber}`,
    text: [
      `${f.carrierName},`,
      '',
      `The damage case for trailer ${f.unitNumber} (${f.terminalName}, ${formatTime(f.handoffAt, f.timeZone)}) is decided: ${DECISION_WORDS[decision]}.`,
      `Repair estimate: ${formatMoney(f.amountCents)}. Charged to your company: ${formatMoney(chargedCents)}.`,
      `Reason: ${reason}`,
      '',
      itemLines(f),
      '',
      'Hitchmark',
    ].join('\n'),
  };
}
