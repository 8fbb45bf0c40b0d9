// The desk's amounts as text: every screen, e-mail and report goes through lib/format/money.ts.
import { describe, expect, it } from 'vitest';
import { centsToDollarsInput, formatMoney } from '@/lib/format/money';

describe('desk amounts as text', () => {
  it('writes cents as US dollars with a thousands separator and two decimals', () => {
    // CLDR en-US currency pattern ¤#,##0.00 with a leading minus sign (from memory)
    expect(formatMoney(123_456)).toBe('$1,234.56');
    expect(formatMoney(5)).toBe('$0.05');
    expect(formatMoney(0)).toBe('$0.00');
    expect(formatMoney(-50)).toBe('-$0.50');
    expect(formatMoney(-123_456)).toBe('-$1,234.56');
  });

  it('keeps the sign of an amount under one dollar in a form field', () => {
    // the old desk helper printed -50 cents as "0.50": Math.trunc(-0.5) is -0, which prints as "0"
    expect(centsToDollarsInput(-50)).toBe('-0.50');
    expect(centsToDollarsInput(-12_345)).toBe('-123.45');
    expect(centsToDollarsInput(7)).toBe('0.07');
  });
});
