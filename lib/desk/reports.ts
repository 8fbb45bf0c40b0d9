// Desk reports: damage by carrier and by month, charged vs absorbed, in integer cents; CSV text.
import { translatorFor } from '@/lib/i18n/translate';
import { toCsv } from '@/lib/format/csv';
import { centsToDollarsInput } from '@/lib/format/money';

export type ReportCaseRow = {
  month: string;
  carrierScac: string | null;
  state: string;
  decision: string | null;
  amountCents: number;
  chargedCents: number | null;
};
export type ReportLine = {
  month: string;
  carrier: string;
  cases: number;
  estimateCents: number;
  chargedCents: number;
  absorbedCents: number;
  waivedCents: number;
  openCents: number;
};

/**
 * Charged: what the decision put on the carrier. Absorbed: the rest of the estimate of a decided
 * charge, share or absorb (the terminal pays the repair). Waived: the estimate of waived cases.
 * Open: the estimate of cases not decided yet.
 */
/** The group of cases proposed to no carrier (the terminal held the trailer, or nobody is attributed). */
export const NO_CARRIER = 'none';

/** A report group's carrier in words: its SCAC, or what "no carrier" means, in `locale`. */
export function reportCarrierLabel(carrier: string, locale: string = 'en'): string {
  return carrier === NO_CARRIER ? translatorFor(locale, 'Desk')('report.noCarrier') : carrier;
}

export function summarizeCases(rows: ReportCaseRow[]): ReportLine[] {
  const lines = new Map<string, ReportLine>();
  for (const r of rows) {
    const carrier = r.carrierScac ?? NO_CARRIER;
    const key = `${r.month}|${carrier}`;
    const line = lines.get(key) ?? {
      month: r.month,
      carrier,
      cases: 0,
      estimateCents: 0,
      chargedCents: 0,
      absorbedCents: 0,
      waivedCents: 0,
      openCents: 0,
    };
    line.cases += 1;
    line.estimateCents += r.amountCents;
    if (!r.decision) line.openCents += r.amountCents;
    else if (r.decision === 'waive') line.waivedCents += r.amountCents;
    else {
      const charged = r.chargedCents ?? 0;
      line.chargedCents += charged;
      line.absorbedCents += Math.max(0, r.amountCents - charged);
    }
    lines.set(key, line);
  }
  return [...lines.values()].sort(
    (a, b) => a.month.localeCompare(b.month) || a.carrier.localeCompare(b.carrier),
  );
}

export function totalsBy<K extends 'month' | 'carrier'>(lines: ReportLine[], key: K) {
  const out = new Map<
    string,
    { label: string; cases: number; chargedCents: number; absorbedCents: number }
  >();
  for (const l of lines) {
    const t = out.get(l[key]) ?? { label: l[key], cases: 0, chargedCents: 0, absorbedCents: 0 };
    t.cases += l.cases;
    t.chargedCents += l.chargedCents;
    t.absorbedCents += l.absorbedCents;
    out.set(l[key], t);
  }
  return [...out.values()].sort((a, b) => a.label.localeCompare(b.label));
}

const HEADER = [
  'month',
  'carrier',
  'cases',
  'estimate_usd',
  'charged_usd',
  'absorbed_usd',
  'waived_usd',
  'open_usd',
] as const;

/** The report as CSV (RFC 4180, CRLF line ends), amounts in dollars with two decimals. */
export function reportCsv(lines: ReportLine[]): string {
  return toCsv(
    HEADER,
    lines.map((l) => [
      l.month,
      l.carrier,
      l.cases,
      ...[l.estimateCents, l.chargedCents, l.absorbedCents, l.waivedCents, l.openCents].map(
        centsToDollarsInput,
      ),
    ]),
  );
}
