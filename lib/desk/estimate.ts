// Repair estimate from the rate card, in integer cents (never floating-point money).
// A rate row applies to a finding when its condition matches and its pattern is the item key or a
// dot-separated prefix of it (`rear` and `rear.door_left` both apply to `rear.door_left.hinge_3`);
// the longest matching pattern wins.
import { formatMoney } from '@/lib/format/money';
import { itemLabel } from './item-labels';

export type RateRow = { itemPattern: string; condition: string; amountCents: number };
export type EstimateFinding = { itemKey: string; condition: string | null };
export type EstimateLine = {
  itemKey: string;
  condition: string | null;
  pattern: string | null;
  amountCents: number;
};
export type Estimate = { lines: EstimateLine[]; totalCents: number; unpricedItemKeys: string[] };

export function patternApplies(pattern: string, itemKey: string): boolean {
  return itemKey === pattern || itemKey.startsWith(`${pattern}.`);
}

/** The most specific rate-card row for one item and condition, or null when none applies. */
export function findRate(rates: RateRow[], itemKey: string, condition: string | null): RateRow | null {
  let best: RateRow | null = null;
  for (const r of rates) {
    if (r.condition !== condition || !patternApplies(r.itemPattern, itemKey)) continue;
    if (!best || r.itemPattern.length > best.itemPattern.length) best = r;
  }
  return best;
}

export function estimateCase(findings: EstimateFinding[], rates: RateRow[]): Estimate {
  const lines = findings.map((f): EstimateLine => {
    const rate = findRate(rates, f.itemKey, f.condition);
    if (rate && !Number.isSafeInteger(rate.amountCents))
      throw new Error(`rate ${rate.itemPattern} is not whole cents`);
    return {
      itemKey: f.itemKey,
      condition: f.condition,
      pattern: rate?.itemPattern ?? null,
      amountCents: rate?.amountCents ?? 0,
    };
  });
  return {
    lines,
    totalCents: lines.reduce((sum, l) => sum + l.amountCents, 0),
    unpricedItemKeys: lines.filter((l) => l.pattern === null).map((l) => l.itemKey),
  };
}

/** The note of the case's `estimated` event: the total, how many items, and which had no rate. */
export function estimateNote(estimate: Estimate): string {
  const missing = estimate.unpricedItemKeys.length
    ? `; no rate for ${estimate.unpricedItemKeys.map(itemLabel).join(', ')}`
    : '';
  return `Rate card: ${formatMoney(estimate.totalCents)} for ${estimate.lines.length} item(s)${missing}`;
}

/** What the case is worth now: the clerk's override when set, else the rate-card estimate. */
export function effectiveAmountCents(c: { estimateCents: number; overrideCents: number | null }): number {
  return c.overrideCents ?? c.estimateCents;
}

/** Parses "1,234.56" or "1234.5" or "1234" dollars into whole cents without floating-point; null when not money. */
export function parseDollarsToCents(text: string): number | null {
  const m = /^\$?\s*(\d{1,3}(?:,\d{3})*|\d+)(?:\.(\d{1,2}))?$/.exec(text.trim());
  if (!m) return null;
  const cents = Number(m[1].replace(/,/g, '')) * 100 + Number((m[2] ?? '').padEnd(2, '0'));
  return Number.isSafeInteger(cents) ? cents : null;
}
