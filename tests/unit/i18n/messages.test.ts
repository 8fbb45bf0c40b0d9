import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { createTranslator } from 'next-intl';
import { describe, expect, it } from 'vitest';
import { LOCALES } from '@/lib/i18n/locales';
import { MESSAGES } from '@/lib/i18n/messages';

const { en, es } = MESSAGES;

type Tree = { [key: string]: string | Tree };
function flatten(tree: Tree, prefix = ''): Record<string, string> {
  return Object.fromEntries(
    Object.entries(tree).flatMap(([k, v]) =>
      typeof v === 'string' ? [[`${prefix}${k}`, v]] : Object.entries(flatten(v, `${prefix}${k}.`)),
    ),
  );
}
const catalogues = { en: flatten(en), es: flatten(es) };

// the names inside {braces} at the top level of an ICU message (ICU MessageFormat syntax)
function argumentNames(message: string): string[] {
  const names = new Set<string>();
  let depth = 0;
  for (let i = 0; i < message.length; i++) {
    if (message[i] === '{') {
      if (depth === 0) names.add(/^\{\s*([A-Za-z]\w*)/.exec(message.slice(i))?.[1] ?? '');
      depth++;
    } else if (message[i] === '}') depth--;
  }
  names.delete('');
  return [...names].sort();
}

describe('message catalogues', () => {
  it('has a catalogue for every locale, and only those', () => {
    expect(Object.keys(catalogues).sort()).toEqual([...LOCALES].sort());
  });

  it.each(LOCALES)('misses no key of the other language in %s', (locale) => {
    const other = locale === 'en' ? 'es' : 'en';
    const missing = Object.keys(catalogues[other]).filter((k) => !(k in catalogues[locale]));
    expect(missing, `keys missing in ${locale}`).toEqual([]);
    expect(Object.keys(catalogues[locale]).length).toBeGreaterThan(20);
  });

  it.each(LOCALES)('has %s messages that parse as ICU, none empty', (locale) => {
    const errors: string[] = [];
    const t = createTranslator({
      locale,
      messages: locale === 'en' ? en : es,
      onError: (e) => errors.push(e.message),
    });
    for (const [key, message] of Object.entries(catalogues[locale])) {
      expect(message.trim(), key).not.toBe('');
      // formatting with every placeholder given a number exercises the ICU parser
      const values = Object.fromEntries(argumentNames(message).map((n) => [n, 2]));
      // a message with rich-text tags (<link>…</link>) is formatted with each tag given a function
      const tags = [...message.matchAll(/<(\w+)>/g)].map((m) => m[1]);
      if (tags.length) {
        const rich = Object.fromEntries(tags.map((tag) => [tag, (chunks: unknown) => chunks]));
        (t.rich as (k: string, v: Record<string, unknown>) => unknown)(key, { ...values, ...rich });
      } else (t as (k: string, v: Record<string, number>) => string)(key, values);
    }
    expect(errors).toEqual([]);
  });

  it('uses the same placeholders in both languages', () => {
    for (const [key, message] of Object.entries(catalogues.en))
      expect(argumentNames(catalogues.es[key] ?? ''), key).toEqual(argumentNames(message));
  });

  it('formats a plural the way each language counts (CLDR plural rules through Intl)', () => {
    const format = (locale: 'en' | 'es', count: number) =>
      createTranslator({ locale, messages: locale === 'en' ? en : es, namespace: 'Gate' })('summary', {
        terminal: 'T',
        count,
      });
    expect(format('en', 1)).toContain('1 trailer in the yard');
    expect(format('en', 3)).toContain('3 trailers in the yard');
    expect(format('es', 1)).toContain('1 caja en el patio');
    expect(format('es', 3)).toContain('3 cajas en el patio');
  });
});

// Every t('key') a screen asks for exists: a file names its namespace once with
// useTranslations('Ns') / getTranslations('Ns') and calls t('key') (common practice in this codebase).
describe('keys used by the screens', () => {
  function files(dir: string): string[] {
    return readdirSync(dir).flatMap((name) => {
      const path = join(dir, name);
      return statSync(path).isDirectory() ? files(path) : /\.tsx?$/.test(name) ? [path] : [];
    });
  }
  const used = files('app').flatMap((file) => {
    const source = readFileSync(file, 'utf8');
    const bindings = [...source.matchAll(/const (\w+) = (?:await )?(?:use|get)Translations\('(\w+)'\)/g)];
    return bindings.flatMap(([, name, ns]) =>
      [...source.matchAll(new RegExp(`\\b${name}\\('([\\w.]+)'`, 'g'))].map((m) => ({
        file,
        key: `${ns}.${m[1]}`,
      })),
    );
  });

  it('finds the translated screens', () => {
    expect(used.length).toBeGreaterThan(15);
  });

  it.each(LOCALES)('has every key a screen asks for in %s', (locale) => {
    const missing = used.filter((u) => !(u.key in catalogues[locale])).map((u) => `${u.file}: ${u.key}`);
    expect(missing).toEqual([]);
  });
});
