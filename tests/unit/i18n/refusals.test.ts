import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { createTranslator } from 'next-intl';
import { describe, expect, it } from 'vitest';
import { HOOK_WORDS } from '@/lib/handoffs/hook-words';
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

  it('says every refusal of a hook at the gate in Spanish, with the unit in place', () => {
    const sent = [
      ...(['out_of_service', 'yard_only', 'perishable_load'] as const).flatMap((because) =>
        [false, true].map((foundNow) => HOOK_WORDS.refused('R53012', because, foundNow)),
      ),
      HOOK_WORDS.perishableAsk('R53012'),
      HOOK_WORDS.perishableField,
    ];
    const keys = sent.map((m) => knownRefusal(m)?.key);
    // each sentence its own message: a refusal found at this hook also says the trailer is now on hold
    expect(new Set(keys).size).toBe(sent.length);
    expect(keys).not.toContain(undefined);
    expect(toSpanish(HOOK_WORDS.refused('R53012', 'out_of_service', false))).toBe(
      'La caja R53012 está fuera de servicio y no puede salir por la caseta.',
    );
    for (const m of sent) expect(toSpanish(m)).not.toMatch(/\b(Trailer|trailer|gate|load)\b/);
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
