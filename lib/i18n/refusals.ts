import enRefusals from '@/lib/i18n/messages/en/Refusals.json';

/**
 * Services and schemas refuse in English (the HTTP API's `message` stays English). The English
 * sentences a screen may show are the `Refusals` catalogue; this finds the key and the values of
 * an English message by its template, so a screen can say it in the reader's language. Pure.
 */
export type RefusalKey = keyof typeof enRefusals;
export type KnownRefusal = { key: RefusalKey; values: Record<string, string> };

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

function compile(template: string): { pattern: RegExp; names: string[] } {
  const names: string[] = [];
  const source = template
    .split(/(\{\w+\})/)
    .map((part) => {
      const name = /^\{(\w+)\}$/.exec(part)?.[1];
      if (!name) return escape(part);
      names.push(name);
      return '(.+?)';
    })
    .join('');
  return { pattern: new RegExp(`^${source}$`, 's'), names };
}

const TEMPLATES = (Object.entries(enRefusals) as [RefusalKey, string][]).map(([key, template]) => ({
  key,
  ...compile(template),
}));

/** The catalogue key and values of an English refusal message, or null when it is not one of ours. */
export function knownRefusal(message: string): KnownRefusal | null {
  for (const { key, pattern, names } of TEMPLATES) {
    const match = pattern.exec(message);
    if (match) return { key, values: Object.fromEntries(names.map((n, i) => [n, match[i + 1]])) };
  }
  return null;
}

/** The message in the reader's language through `translate` (a `Refusals` translator); unknown ones unchanged. */
export function localizeRefusal(
  message: string,
  translate: (key: RefusalKey, values: Record<string, string>) => string,
): string {
  const known = knownRefusal(message);
  return known ? translate(known.key, known.values) : message;
}
