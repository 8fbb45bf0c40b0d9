import { describe, expect, it } from 'vitest';
import { dollarsSchema, overrideEstimateSchema, REASON_MAX } from '@/lib/validation/desk';

const CASE = '3f1c2b7e-8a4d-4c1e-9b2a-6d5e4f3a2b1c';
const caseDecisionMessage = (reason: string) => {
  const r = overrideEstimateSchema.safeParse({ caseId: CASE, amount: '10.00', reason });
  return r.success ? null : r.error.issues[0].message;
};

// Issue 11, item 12: each message says what is actually wrong (common practice: a clerk reads it out).
const problem = (text: string) => {
  const r = dollarsSchema.safeParse(text);
  return r.success ? null : r.error.issues[0].message;
};

describe('amount messages say what is wrong', () => {
  it('accepts dollars and cents', () => {
    expect(dollarsSchema.parse('1,234.56')).toBe(123456);
    expect(dollarsSchema.parse('425')).toBe(42500);
  });
  it('a negative amount', () => expect(problem('-5')).toBe('An amount cannot be negative.'));
  it('a huge amount, safe integer or not', () => {
    expect(problem('1000000.01')).toBe('An amount is at most $1,000,000.00.');
    expect(problem('99999999999999999999999')).toBe('An amount is at most $1,000,000.00.');
  });
  it('three decimals', () =>
    expect(problem('12.345')).toBe('Use at most two decimals (cents), like 425.50.'));
  it('misplaced commas', () =>
    expect(problem('12,34.00')).toBe('Put commas only between groups of three digits, like 1,250.00.'));
  it('letters', () =>
    expect(problem('twelve')).toBe('Enter an amount in dollars using digits only, like 425.00.'));
  it('nothing typed', () => expect(problem('  ')).toBe('Enter an amount in dollars, like 425.00.'));
  it('a reason that is too long says so, not "a few words at least"', () => {
    expect(caseDecisionMessage('x'.repeat(5000))).toBe(
      `A reason is at most ${REASON_MAX} characters; shorten it.`,
    );
    expect(caseDecisionMessage('ok')).toBe('Give a reason (a few words at least).');
  });
});
