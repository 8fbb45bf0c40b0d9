// The English sentences and words of the message catalogues, as a Spanish page must not show them.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { expect, type Page } from '@playwright/test';
import { createTranslator } from 'use-intl/core';

type Tree = { [key: string]: string | Tree };
export type Lang = 'en' | 'es';

// read from the files (Playwright's loader does not take JSON imports): lib/i18n/messages/<lang>/<Ns>.json
function catalogue(lang: Lang): Record<string, Tree> {
  const dir = join('lib/i18n/messages', lang);
  return Object.fromEntries(
    readdirSync(dir)
      .filter((f) => f.endsWith('.json'))
      .map((f) => [f.replace(/\.json$/, ''), JSON.parse(readFileSync(join(dir, f), 'utf8')) as Tree]),
  );
}
const MESSAGES = { en: catalogue('en'), es: catalogue('es') };

export type Say = (key: string, values?: Record<string, string | number>) => string;

/** The messages of one namespace in `lang`, formatted as the app formats them (use-intl, ICU). */
export function say(lang: Lang, namespace: string): Say {
  if (!MESSAGES[lang][namespace]) throw new Error(`no namespace ${namespace}`);
  const t = createTranslator({ locale: lang, messages: MESSAGES[lang], namespace } as never) as unknown;
  return t as Say;
}

function flatten(tree: Tree, prefix = ''): [string, string][] {
  return Object.entries(tree).flatMap(([k, v]) =>
    typeof v === 'string' ? [[`${prefix}${k}`, v] as [string, string]] : flatten(v, `${prefix}${k}.`),
  );
}

/** The text of an ICU message outside every {argument} (plural branches included): what is always printed. */
export function fixedParts(message: string): string[] {
  const parts: string[] = [];
  let depth = 0;
  let current = '';
  for (const ch of message) {
    if (ch === '{') {
      if (depth === 0) parts.push(current);
      current = '';
      depth++;
    } else if (ch === '}') depth--;
    else if (depth === 0) current += ch;
  }
  parts.push(current);
  return parts
    .map((p) => p.replace(/^[\s\p{P}\p{S}]+|[\s\p{P}\p{S}]+$/gu, ''))
    .filter((p) => (p.match(/\p{L}/gu) ?? []).length >= 3);
}

/**
 * English fragments to look for: every fixed part of an English message of the given namespaces,
 * unless the Spanish message of the same key, or any Spanish message, uses it too (units, codes,
 * "VIN", "CSV", names of the product), which a Spanish page may rightly show.
 */
export function englishFragments(namespaces: readonly string[]): string[] {
  const spanishAll = flatten(MESSAGES.es as Tree)
    .map(([, v]) => v)
    .join('\n');
  const fragments = new Set<string>();
  for (const ns of namespaces) {
    if (!MESSAGES.en[ns]) throw new Error(`no namespace ${ns}`);
    const es = Object.fromEntries(flatten(MESSAGES.es[ns]));
    for (const [key, english] of flatten(MESSAGES.en[ns])) {
      if (english === es[key]) continue;
      const parts = fixedParts(english);
      // a lone word cut out of a longer sentence ("Row" of "Row {name} added.") may be a name in the
      // data; a one-word message (a tab, a column, a button) is looked for as it is
      const isSentence = parts.length > 1 || parts[0] !== english.trim();
      for (const part of parts)
        if (isSentence && !/\s/.test(part)) continue;
        else if (!(es[key] ?? '').includes(part) && !spanishAll.includes(part)) fragments.add(part);
    }
  }
  return [...fragments];
}

/**
 * The page's visible text and accessible names (aria-label, placeholder, title), without the
 * elements marked data-stored-text: stored text (names, e-mails, notes) and the engine's reasons and vocabulary, whose translation this
 * catalogue does not own (they are rendered from codes by their own work).
 */
export async function pageWords(page: Page): Promise<string> {
  return page.evaluate(() => {
    const hidden = [...document.querySelectorAll<HTMLElement>('[data-stored-text]')];
    const before = hidden.map((el) => el.style.display);
    hidden.forEach((el) => (el.style.display = 'none'));
    const names = [...document.querySelectorAll<HTMLElement>('[aria-label], [placeholder], [title]')]
      .filter((el) => !el.closest('[data-stored-text]'))
      .flatMap((el) => ['aria-label', 'placeholder', 'title'].map((a) => el.getAttribute(a) ?? ''));
    const text = document.body.innerText;
    hidden.forEach((el, i) => (el.style.display = before[i]));
    return [text, ...names].join('\n');
  });
}

/** The fragments found in the text as whole words (case as written). */
export function leaks(text: string, fragments: string[]): string[] {
  const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  return fragments.filter((f) =>
    new RegExp(`(?<![\\p{L}\\p{N}])${escape(f)}(?![\\p{L}\\p{N}])`, 'u').test(text),
  );
}

/**
 * English month and weekday names (long and short, as Intl's en-US data writes them): a date the
 * formatter wrote in English on a Spanish page. Names Spanish writes the same way (none today, as
 * Spanish writes them in lower case) are left out.
 */
export function englishDateWords(): string[] {
  const names = (locale: string, options: Intl.DateTimeFormatOptions, days: number[]) =>
    days.map((d) =>
      new Intl.DateTimeFormat(locale, { ...options, timeZone: 'UTC' }).format(Date.UTC(2026, 0, d)),
    );
  const months = (locale: string, month: 'long' | 'short') =>
    [...Array(12).keys()].map((m) =>
      new Intl.DateTimeFormat(locale, { month, timeZone: 'UTC' }).format(Date.UTC(2026, m, 15)),
    );
  // 4–10 January 2026 is Sunday to Saturday
  const week = [4, 5, 6, 7, 8, 9, 10];
  const words = (locale: string) => [
    ...months(locale, 'long'),
    ...months(locale, 'short'),
    ...names(locale, { weekday: 'long' }, week),
    ...names(locale, { weekday: 'short' }, week),
  ];
  const spanish = new Set(words('es').map((w) => w.replace(/\.$/, '')));
  return [...new Set(words('en-US'))].filter((w) => !spanish.has(w));
}

/**
 * Fails when the page, as it is now, shows any of the English fragments (visible text and
 * accessible names, stored text excepted). `where` names the page or step in the message.
 */
export async function expectNoEnglishOn(page: Page, fragments: string[], where: string) {
  await expect(page.locator('html')).toHaveAttribute('lang', 'es');
  const found = leaks(await pageWords(page), fragments);
  expect(found, `English on ${where}`).toEqual([]);
}
