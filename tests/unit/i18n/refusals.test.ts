import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { createTranslator } from 'next-intl';
import { describe, expect, it } from 'vitest';
import { knownRefusal, localizeRefusal } from '@/lib/i18n/refusals';
import { MESSAGES } from '@/lib/i18n/messages';

const es = createTranslator({ locale: 'es', messages: MESSAGES.es, namespace: 'Refusals' });
const toSpanish = (message: string) => localizeRefusal(message, (key, values) => es(key, values));

describe('refusals in the reader’s language', () => {
  it('finds the key and the values of a templated English refusal', () => {
    // the sentence lib/server/yard/moves.ts refuses with (common practice: a message template)
    expect(knownRefusal("R53012 is not in this terminal's yard.")).toEqual({
      key: 'unitNotInYard',
      values: { unit: 'R53012' },
    });
    expect(knownRefusal('D4 still holds R53012: move it first.')).toEqual({
      key: 'spotHolds',
      values: { spot: 'D4', unit: 'R53012' },
    });
  });

  it('says a known refusal in Spanish with its values in place', () => {
    expect(toSpanish('R53012 is already in A-07.')).toBe('R53012 ya está en A-07.');
    expect(toSpanish('Choose at least one row.')).toBe('Escoja al menos una fila.');
  });

  it('leaves a message it does not know as it is', () => {
    expect(knownRefusal('Some sentence no service says.')).toBeNull();
    expect(toSpanish('Some sentence no service says.')).toBe('Some sentence no service says.');
  });

  // every catalogue sentence without a placeholder is really sent somewhere: a reworded service
  // message would otherwise go out untranslated without anyone noticing
  it('has only sentences the code really sends', () => {
    function files(dir: string): string[] {
      return readdirSync(dir).flatMap((name) => {
        const path = join(dir, name);
        return statSync(path).isDirectory() ? files(path) : /\.tsx?$/.test(name) ? [path] : [];
      });
    }
    const source = [...files('lib'), ...files('app')]
      .filter((f) => !f.includes('i18n'))
      .map((f) => readFileSync(f, 'utf8'))
      .join('\n');
    const english = MESSAGES.en.Refusals as Record<string, string>;
    const unused = Object.entries(english)
      .filter(([, m]) => !m.includes('{') && !source.includes(m))
      .map(([k]) => k);
    expect(unused).toEqual([]);
  });
});
