// What a handoff receipt says, on screen, in the e-mail and on the public verify page. Pure.
import { formatWhen } from '@/lib/engine';
import { formatVerificationCode } from './verification-code';

export type ReceiptView = {
  handoffId: string;
  unitNumber: string;
  kind: 'drop' | 'hook';
  occurredAt: Date;
  terminalName: string;
  timeZone: string;
  carrierName: string;
  driverName: string;
  tractorNumber: string;
  isLoaded: boolean;
  sealNumber: string | null;
  fuelEighths: number | null;
  spotLabel: string | null;
  verificationCode: string;
  contentHash: string;
  findings: { kind: string; itemKey: string; reason: string }[];
  holds: { severity: 'out_of_service' | 'restricted'; restriction: string | null; reason: string }[];
  photos: { id: string; itemKey: string | null }[];
};

/**
 * Who gets a receipt: the driver when their account has an e-mail address, with the carrier's
 * contact in copy; otherwise the carrier's contact alone. Pure.
 */
export function receiptRecipients(driverEmail: string | null, carrierEmail: string) {
  if (!driverEmail) return { to: carrierEmail, cc: null };
  return {
    to: driverEmail,
    cc: driverEmail.toLowerCase() === carrierEmail.toLowerCase() ? null : carrierEmail,
  };
}

export const FINDING_WORDS: Record<string, string> = {
  new: 'New damage',
  worse: 'Worse than before',
  repaired: 'Repaired',
  first_record: 'Damage, first record',
  fuel_short: 'Fuel short',
  fuel_unexplained_drop: 'Fuel drop not explained',
  pin_not_engaged: 'Locking pin not engaged',
  spare_unusable: 'Spare not usable',
};

export const HOLD_WORDS = {
  out_of_service: 'Out of service: may not leave the gate',
  restricted: 'Restricted',
} as const;

export const RESTRICTION_WORDS: Record<string, string> = {
  no_perishable: 'no perishable loads',
  yard_only: 'yard moves only',
};

export function holdTitle(h: ReceiptView['holds'][number]): string {
  return h.severity === 'restricted' && h.restriction
    ? `${HOLD_WORDS.restricted}: ${RESTRICTION_WORDS[h.restriction] ?? h.restriction}`
    : HOLD_WORDS[h.severity];
}

export function receiptSubject(v: ReceiptView): string {
  return `Hitchmark receipt: ${v.kind} of trailer ${v.unitNumber}, code ${formatVerificationCode(v.verificationCode)}`;
}

/** The plain-text e-mail body. */
export function receiptText(v: ReceiptView, verifyUrl: string): string {
  const lines = [
    `Hitchmark handoff receipt`,
    ``,
    `Trailer: ${v.unitNumber}`,
    `${v.kind === 'drop' ? 'Drop (gate in)' : 'Hook (gate out)'} at ${v.terminalName}, ${formatWhen(v.occurredAt, v.timeZone)}`,
    `Carrier: ${v.carrierName}; driver: ${v.driverName}; tractor: ${v.tractorNumber}`,
    `${v.isLoaded ? 'Loaded' : 'Empty'}${v.sealNumber ? `, seal ${v.sealNumber}` : ''}${v.fuelEighths !== null ? `; fuel ${v.fuelEighths}/8` : ''}${v.spotLabel ? `; slot ${v.spotLabel}` : ''}`,
    ``,
    `Findings (${v.findings.length}):`,
    ...(v.findings.length
      ? v.findings.map((f) => `- ${FINDING_WORDS[f.kind] ?? f.kind}: ${f.reason}`)
      : ['- none: no change from the last record']),
    ``,
    `Holds (${v.holds.length}):`,
    ...(v.holds.length ? v.holds.map((h) => `- ${holdTitle(h)}. ${h.reason}`) : ['- none']),
  ];
  if (v.holds.some((h) => h.severity === 'out_of_service')) {
    lines.push(
      '',
      'An out-of-service trailer is not moved on a public road until a qualified technician has repaired it.',
    );
  }
  lines.push(
    '',
    `Photos: ${v.photos.length}`,
    '',
    `Verification code: ${formatVerificationCode(v.verificationCode)}`,
    `Anyone holding this receipt can check it at ${verifyUrl}`,
    '',
    "Hitchmark's checks support, and do not replace, the driver's own inspection (49 CFR 396.11 and 396.13).",
  );
  return lines.join('\n');
}
