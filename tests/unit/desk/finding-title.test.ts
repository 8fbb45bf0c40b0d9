import { describe, expect, it } from 'vitest';
import { findingTitle } from '@/lib/desk/finding-title';

describe('a finding heading a clerk can read out', () => {
  it('says a fuel finding in words, never its stored key', () => {
    const fuel = { kind: 'fuel_short', itemKey: 'readings.fuel', condition: null };
    expect(findingTitle(fuel, 'en')).toMatch(/^Fuel short: /);
    expect(findingTitle(fuel, 'es')).toMatch(/^Falta diésel: /);
    for (const locale of ['en', 'es']) expect(findingTitle(fuel, locale)).not.toContain('fuel_short');
  });

  it('says the item and its condition in the reader’s language', () => {
    const skin = { kind: 'worse', itemKey: 'left_side.skin', condition: 'unsafe' };
    expect(findingTitle(skin, 'en')).toBe('Worse than before: Left side skin — unsafe (out of service)');
    expect(findingTitle(skin, 'es')).toBe(
      'Peor que antes: Lámina del lado izquierdo — insegura (fuera de servicio)',
    );
    const unchecked = { kind: 'new', itemKey: 'left_side.skin', condition: 'not_checked' };
    expect(findingTitle(unchecked, 'en')).not.toContain('not_checked');
  });

  it('an unknown kind is called a finding, not shown as a key', () => {
    expect(findingTitle({ kind: 'mystery_rule', itemKey: 'nose.header', condition: null }, 'en')).toMatch(
      /^Finding: /,
    );
  });
});
