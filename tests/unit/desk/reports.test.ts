import { describe, expect, it } from 'vitest';
import { NO_CARRIER, reportCarrierLabel, reportCsv, summarizeCases, totalsBy } from '@/lib/desk/reports';

const rows = [
  {
    month: '2026-10',
    carrierScac: 'OSFW',
    state: 'decided',
    decision: 'share',
    amountCents: 85_000,
    chargedCents: 42_500,
  },
  {
    month: '2026-10',
    carrierScac: 'OSFW',
    state: 'closed',
    decision: 'charge',
    amountCents: 45_000,
    chargedCents: 45_000,
  },
  {
    month: '2026-10',
    carrierScac: 'PLRD',
    state: 'decided',
    decision: 'waive',
    amountCents: 12_000,
    chargedCents: 0,
  },
  {
    month: '2026-11',
    carrierScac: 'OSFW',
    state: 'open',
    decision: null,
    amountCents: 30_000,
    chargedCents: null,
  },
  {
    month: '2026-11',
    carrierScac: null,
    state: 'decided',
    decision: 'absorb',
    amountCents: 20_001,
    chargedCents: 0,
  },
];

describe('desk reports', () => {
  it('splits each estimate into charged, absorbed, waived and open', () => {
    const lines = summarizeCases(rows);
    expect(lines.map((l) => `${l.month} ${l.carrier}`)).toEqual([
      '2026-10 OSFW',
      '2026-10 PLRD',
      '2026-11 none',
      '2026-11 OSFW',
    ]);
    expect(lines[0]).toMatchObject({
      cases: 2,
      estimateCents: 130_000,
      chargedCents: 87_500,
      absorbedCents: 42_500,
    });
    expect(lines[1]).toMatchObject({ waivedCents: 12_000, chargedCents: 0, absorbedCents: 0 });
    expect(lines[3]).toMatchObject({ openCents: 30_000 });
    expect(lines[2]).toMatchObject({ absorbedCents: 20_001 });
    // every cent of every estimate lands in exactly one bucket
    for (const l of lines)
      expect(l.chargedCents + l.absorbedCents + l.waivedCents + l.openCents).toBe(l.estimateCents);
  });

  it('totals by carrier', () => {
    const t = totalsBy(summarizeCases(rows), 'carrier');
    expect(t.find((x) => x.label === 'OSFW')).toMatchObject({ cases: 3, chargedCents: 87_500 });
  });

  it('writes RFC 4180 CSV: CRLF line ends, amounts in dollars with two decimals', () => {
    // RFC 4180 §2 rule 2: every record ends with CRLF.
    const csv = reportCsv(summarizeCases(rows));
    const lines = csv.split('\r\n');
    expect(lines[0]).toBe('month,carrier,cases,estimate_usd,charged_usd,absorbed_usd,waived_usd,open_usd');
    expect(lines[1]).toBe('2026-10,OSFW,2,1300.00,875.00,425.00,0.00,0.00');
    expect(lines[3]).toBe('2026-11,none,1,200.01,0.00,200.01,0.00,0.00');
    expect(csv.endsWith('\r\n')).toBe(true);
  });

  it('quotes and neutralizes what a carrier code could smuggle into a spreadsheet', () => {
    const odd = (carrierScac: string) => ({ ...rows[0], month: '2026-12', carrierScac });
    const lines = reportCsv(summarizeCases([odd('a,b'), odd('say "hi"'), odd('=SUM(A1)')])).split('\r\n');
    // OWASP "CSV injection": a cell starting with = is prefixed with a quote so it stays text
    expect(lines[1]).toBe("2026-12,'=SUM(A1),1,850.00,425.00,425.00,0.00,0.00");
    // RFC 4180 §2 rules 6 and 7: a field with a comma or a quote is quoted, its quotes doubled
    expect(lines[2]).toBe('2026-12,"a,b",1,850.00,425.00,425.00,0.00,0.00');
    expect(lines[3]).toBe('2026-12,"say ""hi""",1,850.00,425.00,425.00,0.00,0.00');
  });
});

describe('the report group of cases proposed to no carrier', () => {
  it('says what "no carrier" means in both languages, and leaves a SCAC as it is', () => {
    const [line] = summarizeCases([
      {
        month: '2026-10',
        carrierScac: null,
        state: 'open',
        decision: null,
        amountCents: 100,
        chargedCents: null,
      },
    ]);
    expect(line.carrier).toBe(NO_CARRIER);
    expect(reportCarrierLabel(line.carrier, 'en')).toBe(
      "No carrier proposed (the terminal's, or not attributed)",
    );
    expect(reportCarrierLabel(line.carrier, 'es')).toBe(
      'Sin transportista propuesto (de la terminal o sin atribuir)',
    );
    expect(reportCarrierLabel('OSFW', 'es')).toBe('OSFW');
  });
});
