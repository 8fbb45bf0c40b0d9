// What a handoff receipt says, on screen, in the e-mail and on the public verify page. Pure.
import { formatStamp } from '@/lib/format/time';
import { storedText } from '@/lib/i18n/reasons';
import type { Locale } from '@/lib/i18n/locales';
import { translatorFor, writingLocale } from '@/lib/i18n/translate';
import { formatVerificationCode } from './verification-code';

type StoredWords = { reason: string; reasonCode?: string | null; reasonParams?: unknown };
export type ReceiptHold = StoredWords & {
  severity: 'out_of_service' | 'restricted';
  restriction: string | null;
};

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
  /** `reason` is the English stored with the row; its code, when present, is rendered per reader. */
  findings: (StoredWords & { kind: string; itemKey: string })[];
  holds: ReceiptHold[];
  photos: { id: string; itemKey: string | null }[];
};

type Reader = { email: string; locale: string | null };
export type ReceiptLetter = { to: string; cc: string | null; locale: Locale };

/**
 * Who gets a receipt, and in which language: the driver when their account has an e-mail address,
 * with the carrier's contact in copy; otherwise the carrier's contact alone. When the two read
 * different languages, each gets their own letter in their own language instead of a copy. Pure.
 */
export function receiptLetters(driver: Reader | null, carrier: Reader): ReceiptLetter[] {
  const toCarrier = { to: carrier.email, cc: null, locale: writingLocale(carrier.locale) };
  if (!driver) return [toCarrier];
  const locale = writingLocale(driver.locale);
  if (driver.email.toLowerCase() === carrier.email.toLowerCase())
    return [{ to: driver.email, cc: null, locale }];
  if (locale === toCarrier.locale) return [{ to: driver.email, cc: carrier.email, locale }];
  return [{ to: driver.email, cc: null, locale }, toCarrier];
}

/** The heading of a finding's kind in `locale` (`fuel_short` → "Fuel short"). */
export function findingWords(kind: string, locale: string | null = 'en'): string {
  const t = translatorFor(locale, 'Mail');
  return t.has(`findingKind.${kind}`) ? t(`findingKind.${kind}`) : t('findingKind.other');
}

export function holdTitle(
  h: Pick<ReceiptHold, 'severity' | 'restriction'>,
  locale: string | null = 'en',
): string {
  const t = translatorFor(locale, 'Mail');
  return h.severity === 'restricted' && h.restriction
    ? t('hold.restrictedTo', { restriction: h.restriction })
    : t(`hold.${h.severity}`);
}

export function receiptSubject(v: ReceiptView, locale: string | null = 'en'): string {
  return translatorFor(locale, 'Mail')('receipt.subject', {
    kind: v.kind,
    unit: v.unitNumber,
    code: formatVerificationCode(v.verificationCode),
  });
}

/** The plain-text e-mail body (and the PDF's lines) in `locale`; times in the terminal's zone. */
export function receiptText(v: ReceiptView, verifyUrl: string, locale: string | null = 'en'): string {
  const lang = writingLocale(locale);
  const t = translatorFor(lang, 'Mail');
  const words = (r: { reason: string; reasonCode?: string | null; reasonParams?: unknown }) =>
    storedText(r.reason, r.reasonCode, r.reasonParams, lang, v.timeZone);
  const load = [
    t(v.isLoaded ? 'receipt.loaded' : 'receipt.empty'),
    v.sealNumber ? t('receipt.seal', { seal: v.sealNumber }) : '',
    v.fuelEighths !== null ? t('receipt.fuel', { fuel: v.fuelEighths }) : '',
    v.spotLabel ? t('receipt.slot', { slot: v.spotLabel }) : '',
  ].join('');
  const lines = [
    t('receipt.title'),
    ``,
    t('receipt.trailer', { unit: v.unitNumber }),
    t('receipt.handoff', {
      kind: v.kind,
      terminal: v.terminalName,
      when: formatStamp(v.occurredAt, v.timeZone, lang),
    }),
    t('receipt.people', { carrier: v.carrierName, driver: v.driverName, tractor: v.tractorNumber }),
    load,
    ``,
    t('receipt.findings', { count: v.findings.length }),
    ...(v.findings.length
      ? v.findings.map((f) => `- ${findingWords(f.kind, lang)}: ${words(f)}`)
      : [t('receipt.noFindings')]),
    ``,
    t('receipt.holds', { count: v.holds.length }),
    ...(v.holds.length ? v.holds.map((h) => `- ${holdTitle(h, lang)}. ${words(h)}`) : [t('receipt.noHolds')]),
  ];
  if (v.holds.some((h) => h.severity === 'out_of_service')) lines.push('', t('receipt.outOfService'));
  lines.push(
    '',
    t('receipt.photos', { count: v.photos.length }),
    '',
    t('receipt.code', { code: formatVerificationCode(v.verificationCode) }),
    t('receipt.verify', { url: verifyUrl }),
    '',
    t('receipt.inspection'),
  );
  return lines.join('\n');
}
