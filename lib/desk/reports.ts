// Desk reports: damage by carrier and by month, charged vs absorbed, in integer cents; CSV text.

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
export function summarizeCases(rows: ReportCaseRow[]): ReportLine[] {
  const lines = new Map<string, ReportLine>();
  for (const r of rows) {
    const carrier = r.carrierScac ?? 'none';
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

/** One CSV field per RFC 4180 §2: quoted when it holds a comma, quote, CR or LF; quotes doubled. */
export function csvField(value: string | number): string {
  const s = String(value);
  // A leading =, +, - or @ would run as a formula in a spreadsheet; prefix it (OWASP "CSV injection").
  const safe = /^[=+\-@]/.test(s) && typeof value === 'string' ? `'${s}` : s;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

const dollars = (cents: number) =>
  `${Math.trunc(cents / 100)}.${String(Math.abs(cents % 100)).padStart(2, '0')}`;

/** The report as CSV with CRLF line ends (RFC 4180), amounts in dollars with two decimals. */
export function reportCsv(lines: ReportLine[]): string {
  const header = [
    'month',
    'carrier',
    'cases',
    'estimate_usd',
    'charged_usd',
    'absorbed_usd',
    'waived_usd',
    'open_usd',
  ];
  const body = lines.map((l) =>
    [
      l.month,
      l.carrier,
      l.cases,
      dollars(l.estimateCents),
      dollars(l.chargedCents),
      dollars(l.absorbedCents),
      dollars(l.waivedCents),
      dollars(l.openCents),
    ]
      .map(csvField)
      .join(','),
  );
  return [header.join(','), ...body].join('\r\n') + '\r\n';
}
