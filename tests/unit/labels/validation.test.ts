import { describe, expect, it } from 'vitest';
import { labelSheetQuerySchema, trailerLookupSchema } from '@/lib/validation/labels';

const firstMessage = (r: { success: boolean; error?: { issues: { message: string }[] } }) =>
  r.error?.issues[0]?.message;

describe('trailer lookup input', () => {
  it('takes exactly one of token, unit or vin', () => {
    expect(trailerLookupSchema.safeParse({ unit: ' r53012 ' }).data).toEqual({ unit: 'R53012' });
    expect(firstMessage(trailerLookupSchema.safeParse({}))).toBe(
      'Look up by exactly one of: token, unit or vin.',
    );
    expect(trailerLookupSchema.safeParse({ unit: 'R53012', vin: '1G4AH59H45G118341' }).success).toBe(false);
  });

  it('accepts VINs whose check digit is right (49 CFR 565.15(c)), with or without the I marker', () => {
    // 1G4AH59H45G118341: the regulation's sample (sum 411, check 4); 1M8GDM9AXKP042788: remainder 10 → X
    expect(trailerLookupSchema.parse({ vin: '1G4AH59H45G118341' })).toEqual({ vin: '1G4AH59H45G118341' });
    expect(trailerLookupSchema.parse({ vin: 'I1M8GDM9AXKP042788' })).toEqual({ vin: '1M8GDM9AXKP042788' });
  });

  it('refuses a bad check digit with a clear message', () => {
    // 5TFEV54198X063405 circulates as "valid" but its check digit computes to 6, not 9 (49 CFR 565.15(c))
    const result = trailerLookupSchema.safeParse({ vin: '5TFEV54198X063405' });
    expect(result.success).toBe(false);
    expect(firstMessage(result)).toMatch(/check digit \(9th character\) is wrong/);
  });

  it('refuses VINs of the wrong length or with I, O or Q', () => {
    expect(firstMessage(trailerLookupSchema.safeParse({ vin: '1G4AH59H45G11834' }))).toBe(
      'A VIN has 17 characters.',
    );
    expect(firstMessage(trailerLookupSchema.safeParse({ vin: '1G4AH59H45G11834O' }))).toMatch(
      /never I, O or Q/,
    );
  });

  it('refuses tokens that cannot be label tokens and unit numbers with odd characters', () => {
    expect(trailerLookupSchema.safeParse({ token: 'has spaces and !' }).success).toBe(false);
    expect(trailerLookupSchema.safeParse({ unit: 'R5; drop table' }).success).toBe(false);
  });
});

describe('label sheet input', () => {
  const a = '0a1b2c3d-4e5f-4607-8819-2a3b4c5d6e7f';
  const b = 'f3b1c2d4-5e6f-4a7b-8c9d-0e1f2a3b4c5d';
  it('reads ids repeated or comma-separated, or one row', () => {
    expect(labelSheetQuerySchema.parse({ ids: `${a},${b}` })).toEqual({ ids: [a, b] });
    expect(labelSheetQuerySchema.parse({ ids: [a, b] })).toEqual({ ids: [a, b] });
    expect(labelSheetQuerySchema.parse({ row: a })).toEqual({ row: a });
  });
  it('refuses both, neither, bad ids and more than 200', () => {
    expect(labelSheetQuerySchema.safeParse({ ids: a, row: b }).success).toBe(false);
    expect(labelSheetQuerySchema.safeParse({}).success).toBe(false);
    expect(labelSheetQuerySchema.safeParse({ ids: 'R53001' }).success).toBe(false);
    expect(labelSheetQuerySchema.safeParse({ ids: Array(201).fill(a) }).success).toBe(false);
  });
});
