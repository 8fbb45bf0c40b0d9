import { describe, expect, it } from 'vitest';
import {
  computeVinCheckDigit,
  decodeTrailerModelYear,
  isEquipmentScac,
  modelYearCandidates,
  validateScac,
  validateVin,
  vinWeightedSum,
} from '@/lib/engine';

describe('validateVin (49 CFR 565.15)', () => {
  it('accepts the regulation sample 1G4AH59H45G118341: weighted sum 411, check digit 4', () => {
    // 49 CFR 565.15(c) worked example; 411 mod 11 = 4.
    expect(vinWeightedSum('1G4AH59H45G118341')).toBe(411);
    expect(computeVinCheckDigit('1G4AH59H45G118341')).toBe('4');
    expect(validateVin('1G4AH59H45G118341')).toEqual({ ok: true, vin: '1G4AH59H45G118341', checkDigit: '4' });
  });

  it('accepts a VIN whose check digit is X (remainder 10)', () => {
    // Widely published worked example: 1M8GDM9AXKP042788, remainder 10 → X.
    expect(computeVinCheckDigit('1M8GDM9AXKP042788')).toBe('X');
    expect(validateVin('1m8gdm9axkp042788 ')).toMatchObject({ ok: true, checkDigit: 'X' });
  });

  it('rejects 5TFEV54198X063405, listed as valid in some public test files: it computes 6, not 9', () => {
    // 49 CFR 565.15(c) applied by hand: the check digit computes to 6 under 565.15(c).
    expect(validateVin('5TFEV54198X063405')).toEqual({
      ok: false,
      error: 'check_digit',
      expectedCheckDigit: '6',
    });
  });

  it('rejects a single changed character (the check digit catches it)', () => {
    expect(validateVin('1G4AH59H45G118342')).toMatchObject({ ok: false, error: 'check_digit' });
  });

  it('rejects wrong length and the letters I, O, Q (565.15: never used)', () => {
    expect(validateVin('1G4AH59H45G11834')).toEqual({ ok: false, error: 'length' });
    expect(validateVin('1G4AH59H45G1183411')).toEqual({ ok: false, error: 'length' });
    expect(validateVin('1G4AH59H45G11834O')).toEqual({ ok: false, error: 'characters' });
    expect(validateVin('IG4AH59H45G118341')).toEqual({ ok: false, error: 'characters' });
    expect(validateVin('1G4AH59H45G1183Q1')).toEqual({ ok: false, error: 'characters' });
  });
});

describe('model year (49 CFR 565.15(d): position 10, 30-year cycle)', () => {
  it('lists the cycle: A = 1980/2010/2040, Y = 2000/2030, 1 = 2001/2031, 9 = 2009/2039; U, Z, 0 unused', () => {
    expect(modelYearCandidates('A').slice(0, 3)).toEqual([1980, 2010, 2040]);
    expect(modelYearCandidates('Y').slice(0, 2)).toEqual([2000, 2030]);
    expect(modelYearCandidates('1').slice(0, 2)).toEqual([2001, 2031]);
    expect(modelYearCandidates('9').slice(0, 2)).toEqual([2009, 2039]);
    for (const c of ['U', 'Z', '0', 'I', 'O', 'Q']) expect(modelYearCandidates(c)).toEqual([]);
  });

  it('picks the latest candidate not after the reference year + 1 (trailer rule)', () => {
    // 1M8GDM9AXKP042788: K → 1989 or 2019; in 2026 the latest allowed is 2019.
    expect(decodeTrailerModelYear('1M8GDM9AXKP042788', 2026)).toBe(2019);
    // 5 in position 10 → 2005 or 2035.
    expect(decodeTrailerModelYear('1G4AH59H45G118341', 2026)).toBe(2005);
    // At the boundary: T = 1996/2026, V = 1997/2027 (next year is allowed), W = 1998/2028.
    const withCode = (c: string) => `1M8GDM9AX${c}P042788`;
    expect(decodeTrailerModelYear(withCode('T'), 2025)).toBe(2026);
    expect(decodeTrailerModelYear(withCode('V'), 2026)).toBe(2027);
    expect(decodeTrailerModelYear(withCode('W'), 2026)).toBe(1998);
    expect(decodeTrailerModelYear(withCode('U'), 2026)).toBeNull();
    expect(decodeTrailerModelYear('short', 2026)).toBeNull();
  });
});

describe('SCAC (NMFTA: 2–4 letters)', () => {
  it('accepts two to four letters and normalises case', () => {
    expect(validateScac('hm')).toEqual({ ok: true, scac: 'HM' });
    expect(validateScac(' HMKT ')).toEqual({ ok: true, scac: 'HMKT' });
  });

  it('rejects one letter, five letters, digits and punctuation', () => {
    for (const bad of ['H', 'HMKTX', 'HM1', 'H-M', ''])
      expect(validateScac(bad)).toEqual({ ok: false, error: 'format' });
  });

  it('knows codes ending U, X, Z are for equipment (NMFTA)', () => {
    expect(isEquipmentScac('HMKZ')).toBe(true);
    expect(isEquipmentScac('HMKU')).toBe(true);
    expect(isEquipmentScac('HMKX')).toBe(true);
    expect(isEquipmentScac('HMKT')).toBe(false);
  });
});
