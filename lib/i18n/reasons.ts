// Puts the engine's coded reasons (lib/engine/types/codes.ts) into words in the reader's language,
// through the Reasons catalogue (lib/i18n/messages/*/Reasons.json). Pure: the caller passes the
// locale and the terminal's time zone; dates go through lib/format/time.ts.
// use-intl's core (next-intl's own base, no React): the seed and scripts load this under the
// react-server condition, where next-intl's entry needs the framework's request context
import { createTranslator } from 'use-intl/core';
import { z } from 'zod';
import type { Reason } from '@/lib/engine';
import { formatStamp } from '@/lib/format/time';
import { itemLabel } from './checklist';
import { DEFAULT_LOCALE, parseLocale, type Locale } from './locales';
import { MESSAGES } from './messages';

type Values = Record<string, string | number>;
type T = ((key: string, values?: Values) => string) & { has: (key: string) => boolean };

const eventSchema = z.object({
  type: z.enum(['drop', 'hook', 'walk']),
  at: z.string(),
  driverName: z.string().nullish(),
  carrierName: z.string().nullish(),
  jockeyName: z.string().nullish(),
  correctedAt: z.string().nullish(),
});
const partySchema = z.union([
  z.object({ type: z.literal('terminal'), name: z.string().nullish() }),
  z.object({ type: z.literal('carrier'), name: z.string() }),
]);
const paramsSchema = z.record(z.string(), z.unknown());

/** Raised while rendering when a code is unknown or a parameter is missing or malformed. */
export class ReasonRenderError extends Error {}

// one translator per language; rendering is synchronous, so the current call's error handler is a module slot
let reportError: (message: string) => void = () => {};
const translators = new Map<Locale, T>();
function translator(locale: Locale, onError: (message: string) => void): T {
  reportError = onError;
  let t = translators.get(locale);
  if (!t) {
    t = createTranslator({
      locale,
      messages: MESSAGES[locale],
      namespace: 'Reasons',
      onError: (e) => reportError(e.message),
    }) as unknown as T;
    translators.set(locale, t);
  }
  return t;
}

function words(t: T, group: 'condition' | 'state', c: unknown): string {
  if (c === null || c === undefined) return t('state.none');
  const k = `${group}.${String(c)}`;
  if (typeof c !== 'string' || !t.has(k)) throw new ReasonRenderError(`unknown condition ${String(c)}`);
  return t(k);
}

function eventWords(t: T, raw: unknown, locale: Locale, zone: string): string {
  const e = eventSchema.parse(raw);
  const when = formatStamp(e.at, zone, locale);
  const base =
    e.type === 'walk'
      ? e.jockeyName
        ? t('event.walkBy', { when, jockey: e.jockeyName })
        : t('event.walk', { when })
      : e.driverName
        ? t('event.handoffByDriver', {
            type: e.type,
            when,
            driver: e.driverName,
            carrier: e.carrierName ?? '',
          })
        : t('event.handoffByCarrier', { type: e.type, when, carrier: e.carrierName ?? '' });
  return e.correctedAt
    ? t('event.corrected', { event: base, when: formatStamp(e.correctedAt, zone, locale) })
    : base;
}

function partyWords(t: T, raw: unknown): string {
  const p = partySchema.parse(raw);
  return p.type === 'carrier' ? p.name : (p.name ?? t('party.terminal'));
}

/** "A", "A and B", "A, B and C" in the reader's language. */
function listOf(t: T, names: string[]): string {
  if (names.length <= 1) return names.join('');
  const head = names.slice(1, -1).reduce((acc, n) => t('list.more', { head: acc, last: n }), names[0]);
  return t('list.two', { first: head, second: names[names.length - 1] });
}

function valuesFor(
  t: T,
  code: string,
  params: Record<string, unknown>,
  locale: Locale,
  zone: string,
  onError: (message: string) => void,
): Values {
  const out: Values = {};
  const conditionGroup = code === 'finding.repaired' ? 'state' : 'condition';
  for (const [k, v] of Object.entries(params)) {
    if (k === 'label') continue;
    if (k === 'item')
      out.label = itemLabel(locale, String(v), typeof params.label === 'string' ? params.label : String(v));
    else if (k === 'previous' || k === 'current') out[k] = words(t, conditionGroup, v);
    else if (k === 'before' || k === 'now') out[k] = eventWords(t, v, locale, zone);
    else if (k === 'holder') out[k] = partyWords(t, v);
    else if (k === 'holders')
      out[k] = listOf(
        t,
        z
          .array(z.unknown())
          .parse(v)
          .map((p) => partyWords(t, p)),
      );
    else if (k === 'reason') {
      const inner = z.object({ code: z.string(), params: z.unknown() }).parse(v);
      out[k] = render(inner.code, inner.params, locale, zone, onError);
    } else if (typeof v === 'boolean') out[k] = String(v);
    else if (typeof v === 'string' || typeof v === 'number') out[k] = v;
    else throw new ReasonRenderError(`parameter ${k} of ${code} is not plain text or a number`);
  }
  return out;
}

function render(
  code: string,
  rawParams: unknown,
  locale: Locale,
  zone: string,
  onError: (message: string) => void,
): string {
  const params = paramsSchema.parse(rawParams ?? {});
  if (code === 'legacy_text') return z.string().parse(params.text);
  const t = translator(locale, onError);
  if (!/^[a-z_]+\.[a-z_]+$/.test(code) || !t.has(code))
    throw new ReasonRenderError(`unknown reason code ${code}`);
  return t(code, valuesFor(t, code, params, locale, zone, onError));
}

export type RenderOptions = {
  /** Shown when the code cannot be rendered (unknown code, missing or malformed parameter). */
  fallback?: string;
  /** Told of every problem; by default a problem only switches to the fallback. */
  onError?: (message: string) => void;
};

/**
 * The words of a coded reason, caution or note in `locale`, dates in the terminal's `timeZone`.
 * Never throws: a code that cannot be rendered gives `fallback` (the English stored with the row)
 * or, without one, the code itself.
 */
export function renderReason(
  code: string,
  params: unknown,
  locale: Locale | string,
  timeZone: string,
  options: RenderOptions = {},
): string {
  const lang = parseLocale(locale) ?? DEFAULT_LOCALE;
  const errors: string[] = [];
  const note = (m: string) => {
    errors.push(m);
    options.onError?.(m);
  };
  try {
    const text = render(code, params, lang, timeZone, note);
    if (!errors.length) return text;
  } catch (e) {
    note(e instanceof Error ? e.message : String(e));
  }
  return options.fallback ?? code;
}

/** `renderReason` for an engine `Reason` object (or null: no words). */
export function renderCoded(
  r: { code: string; params: unknown } | Reason | null | undefined,
  locale: Locale | string,
  timeZone: string,
  options?: RenderOptions,
): string {
  return r ? renderReason(r.code, r.params, locale, timeZone, options) : '';
}

/** The English words of a reason: the text receipted with the row at the time it was written. */
export function englishReason(r: { code: string; params: unknown }, timeZone: string): string {
  return renderReason(r.code, r.params, 'en', timeZone);
}

/**
 * A stored reason in the reader's language: its code rendered when it has one, else (and when the
 * code cannot be rendered) the English stored with it.
 */
export function storedText(
  text: string,
  code: string | null | undefined,
  params: unknown,
  locale: Locale | string,
  timeZone: string,
): string {
  return code ? renderReason(code, params, locale, timeZone, { fallback: text }) : text;
}

type StoredReason = { reason: string; reasonCode?: string | null; reasonParams?: unknown };
type StoredCaution = { caution?: string | null; cautionCode?: string | null; cautionParams?: unknown };

/** Rows (findings, holds) with `reason` and `caution` put into the reader's language. */
export function readable<R extends StoredReason & StoredCaution>(
  rows: readonly R[],
  locale: Locale | string,
  timeZone: string,
): R[] {
  return rows.map((r) => ({
    ...r,
    reason: storedText(r.reason, r.reasonCode, r.reasonParams, locale, timeZone),
    ...(r.caution
      ? { caution: storedText(r.caution, r.cautionCode, r.cautionParams, locale, timeZone) }
      : {}),
  }));
}
