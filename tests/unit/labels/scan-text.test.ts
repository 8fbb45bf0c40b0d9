import { describe, expect, it } from 'vitest';
import { classifyScan, extractLabelToken, normalizeScannedVin } from '@/lib/labels/scan-text';

const TOKEN = 'AQ' + 'x'.repeat(40) + '_-9';

describe('reading scanned text', () => {
  it('takes the token from a Hitchmark label link on any host', () => {
    expect(extractLabelToken(`https://gate.hitchmark.example/l/${TOKEN}`)).toBe(TOKEN);
    expect(extractLabelToken(`http://localhost:3501/l/${TOKEN}/`)).toBe(TOKEN);
    expect(classifyScan(` https://a.example/l/${TOKEN} `)).toEqual({ kind: 'token', token: TOKEN });
  });

  it('refuses links that are not label links', () => {
    expect(extractLabelToken(`https://a.example/x/${TOKEN}`)).toBeNull();
    expect(extractLabelToken(`ftp://a.example/l/${TOKEN}`)).toBeNull();
    expect(extractLabelToken(`https://a.example/l/short`)).toBeNull();
    expect(extractLabelToken(`https://a.example/l/${TOKEN}?x=1%20`)).toBe(TOKEN);
    expect(extractLabelToken('not a link')).toBeNull();
  });

  it('drops a leading I import marker only when the rest is a valid VIN (49 CFR 565.15)', () => {
    // 1G4AH59H45G118341: the regulation's own sample VIN (check digit 4); I never appears in a VIN
    expect(normalizeScannedVin('I1G4AH59H45G118341')).toBe('1G4AH59H45G118341');
    expect(normalizeScannedVin(' 1g4ah59h45g118341 ')).toBe('1G4AH59H45G118341');
    // same 18 characters with a wrong check digit: the I stays, so validation rejects it later
    expect(normalizeScannedVin('I1G4AH59H55G118341')).toBe('I1G4AH59H55G118341');
  });

  it('treats 17 characters as a VIN, anything else as unknown', () => {
    expect(classifyScan('I1M8GDM9AXKP042788')).toEqual({ kind: 'vin', vin: '1M8GDM9AXKP042788' });
    expect(classifyScan('B07')).toEqual({ kind: 'unknown', text: 'B07' });
    expect(classifyScan('x'.repeat(500))).toMatchObject({ kind: 'unknown', text: 'x'.repeat(200) });
  });
});
