import { describe, expect, it } from 'vitest';
import { knownRefusal } from '@/lib/i18n/refusals';
import { replacedMessage } from '@/lib/labels/wording';

describe('the words of a replaced label', () => {
  it('dates the replacement in the terminal’s zone, not the server’s', () => {
    // IANA tz database: America/Chicago is UTC−6 (CST) in December, so 03:30 UTC is still the 1st there
    const at = new Date('2026-12-02T03:30:00Z');
    expect(replacedMessage(at, 'America/Chicago')).toBe(
      'This label was replaced on Dec 1, 2026; use the new label.',
    );
    expect(replacedMessage(at, 'UTC')).toBe('This label was replaced on Dec 2, 2026; use the new label.');
  });
  it('writes the date in the reader’s locale, which the Spanish template then carries', () => {
    // Unicode CLDR es: medium date "1 dic 2026" (same instant and zone as above)
    const message = replacedMessage(new Date('2026-12-02T03:30:00Z'), 'America/Chicago', 'es');
    expect(message).toBe('This label was replaced on 1 dic 2026; use the new label.');
    expect(knownRefusal(message)).toEqual({ key: 'replacedOn', values: { date: '1 dic 2026' } });
  });
  it('still says what to do when the date is unknown', () => {
    expect(replacedMessage(null, 'America/Chicago')).toBe('This label was replaced; use the new label.');
  });
});
