import { describe, expect, it } from 'vitest';
import {
  effectiveAmountCents,
  estimateCase,
  estimateNote,
  findRate,
  parseDollarsToCents,
  type RateRow,
} from '@/lib/desk/estimate';
import { centsToDollarsInput } from '@/lib/format/money';

// Invented demo prices (the same shape as the seed's rate card), in whole cents.
const rates: RateRow[] = [
  { itemPattern: 'rear', condition: 'damaged', amountCents: 45_000 },
  { itemPattern: 'rear.door_left', condition: 'damaged', amountCents: 52_500 },
  { itemPattern: 'rear', condition: 'missing', amountCents: 30_000 },
  { itemPattern: 'left_side', condition: 'damaged', amountCents: 85_000 },
  { itemPattern: 'tires', condition: 'unsafe', amountCents: 52_000 },
];

describe('estimate from the rate card', () => {
  it('uses the most specific pattern for the condition', () => {
    expect(findRate(rates, 'rear.door_left.hinge_3', 'damaged')?.amountCents).toBe(52_500);
    expect(findRate(rates, 'rear.door_right.hinge_3', 'damaged')?.amountCents).toBe(45_000);
    expect(findRate(rates, 'rear.door_left.hinge_3', 'missing')?.amountCents).toBe(30_000);
  });

  it('matches whole key segments only', () => {
    // "rear" must not price "rearview.x", and "left_side" must not price "left_sideboard".
    expect(findRate(rates, 'rearview.mirror', 'damaged')).toBeNull();
    expect(findRate(rates, 'left_sideboard', 'damaged')).toBeNull();
  });

  it('adds the lines in integer cents and lists items without a price', () => {
    const e = estimateCase(
      [
        { itemKey: 'left_side.skin', condition: 'damaged' },
        { itemKey: 'rear.door_left.seal', condition: 'damaged' },
        { itemKey: 'tires.axle1.left_outer', condition: 'unsafe' },
        { itemKey: 'interior.floor', condition: 'damaged' },
      ],
      rates,
    );
    expect(e.totalCents).toBe(85_000 + 52_500 + 52_000);
    expect(Number.isInteger(e.totalCents)).toBe(true);
    expect(e.unpricedItemKeys).toEqual(['interior.floor']);
  });

  it('keeps cents exact where binary floating point would drift', () => {
    // 0.1 + 0.2 !== 0.3 in IEEE 754 double precision (ECMAScript Number semantics); in cents it is exact.
    const dimes = Array.from({ length: 3 }, () => ({
      itemPattern: 'x',
      condition: 'damaged',
      amountCents: 10,
    }));
    const e = estimateCase(
      [
        { itemKey: 'x', condition: 'damaged' },
        { itemKey: 'x', condition: 'damaged' },
        { itemKey: 'x', condition: 'damaged' },
      ],
      dimes,
    );
    expect(e.totalCents).toBe(30);
    expect(0.1 + 0.2).not.toBe(0.3);
  });

  it('refuses a rate that is not whole cents', () => {
    expect(() =>
      estimateCase(
        [{ itemKey: 'x', condition: 'damaged' }],
        [{ itemPattern: 'x', condition: 'damaged', amountCents: 10.5 }],
      ),
    ).toThrow();
  });

  it('prefers the override when the clerk set one', () => {
    expect(effectiveAmountCents({ estimateCents: 85_000, overrideCents: null })).toBe(85_000);
    expect(effectiveAmountCents({ estimateCents: 85_000, overrideCents: 0 })).toBe(0);
  });

  it('says what the rate card priced and what it could not', () => {
    const e = estimateCase(
      [
        { itemKey: 'left_side.skin', condition: 'damaged' },
        { itemKey: 'interior.floor', condition: 'damaged' },
      ],
      rates,
    );
    expect(estimateNote(e)).toBe('Rate card: $850.00 for 2 item(s); no rate for Floor (cracks and gaps)');
  });

  it('parses dollars without floats', () => {
    expect(parseDollarsToCents('1,234.56')).toBe(123_456);
    expect(parseDollarsToCents('425.5')).toBe(42_550);
    expect(parseDollarsToCents('$19.99')).toBe(1999);
    expect(parseDollarsToCents('12.345')).toBeNull();
    expect(parseDollarsToCents('-5')).toBeNull();
    expect(parseDollarsToCents('abc')).toBeNull();
  });
});

describe('dollars text for form fields', () => {
  it('writes whole cents back as dollars with two decimals that parse back to the same cents', () => {
    expect(centsToDollarsInput(85_000)).toBe('850.00');
    expect(centsToDollarsInput(42_505)).toBe('425.05');
    expect(parseDollarsToCents(centsToDollarsInput(123_456_78))).toBe(123_456_78);
  });
});
