// The words of the case e-mails. Pure: the caller passes every fact, the time zone and the link.
import { formatWhen } from '@/lib/engine/wording';
import type { Decision } from './case-state';
import { formatCents } from './estimate';

export type CaseEmailFacts = {
  unitNumber: string;
  terminalName: string;
  carrierName: string;
  timeZone: string;
  handoffAt: Date;
  amountCents: number;
  items: { label: string; before: string | null; after: string | null; reason: string }[];
};

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
      `Trailer ${f.unitNumber} was recorded with new damage at ${f.terminalName} on ${formatWhen(f.handoffAt, f.timeZone)}.`,
      'Hitchmark compared the handoff with the earlier record of each item:',
      '',
      itemLines(f),
      '',
      `Repair estimate: ${formatCents(f.amountCents)}.`,
      `You may dispute this case with a note until ${formatWhen(deadline, f.timeZone)} (${f.timeZone}).`,
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
      `The damage case for trailer ${f.unitNumber} (${f.terminalName}, ${formatWhen(f.handoffAt, f.timeZone)}) is decided: ${DECISION_WORDS[decision]}.`,
      `Repair estimate: ${formatCents(f.amountCents)}. Charged to your company: ${formatCents(chargedCents)}.`,
      `Reason: ${reason}`,
      '',
      itemLines(f),
      '',
      'Hitchmark',
    ].join('\n'),
  };
}
