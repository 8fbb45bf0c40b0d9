// The checklist's zones and items in the reader's language. The engine (lib/engine/checklist.ts)
// keys every zone and item and keeps its English label for stored records; screens and letters
// say them through the Checklist catalogue (lib/i18n/messages/*/Checklist.json). Pure.
import type { ChecklistItem, ChecklistZone } from '@/lib/engine';
import { MESSAGES } from './messages';
import { translatorFor, writingLocale } from './translate';

/** A Checklist catalogue key and the values its message takes. */
export type ChecklistMessage = { key: string; values?: Record<string, string | number> };

// Items the engine repeats by side, door, pin position or axle share one message with a value.
const PATTERNS: [RegExp, (m: RegExpExecArray) => ChecklistMessage][] = [
  [/^(left|right)_side\.(\w+)$/, (m) => ({ key: `items.side.${m[2]}`, values: { side: m[1] } })],
  [
    /^undercarriage\.tandem_pin\.(\w+)$/,
    (m) => ({ key: 'items.undercarriage.tandem_pin', values: { position: m[1] } }),
  ],
  [
    /^tires\.axle(\d+)\.(\w+)$/,
    (m) => ({ key: 'items.tire', values: { axle: Number(m[1]), position: m[2] } }),
  ],
  [
    /^rear\.door_(left|right)\.hinge_(\d+)$/,
    (m) => ({ key: 'items.door.hinge', values: { door: m[1], n: Number(m[2]) } }),
  ],
  [/^rear\.door_(left|right)\.(\w+)$/, (m) => ({ key: `items.door.${m[2]}`, values: { door: m[1] } })],
];

/** The catalogue message of a checklist item key (the key itself under `items.` when not repeated). */
export function itemMessage(itemKey: string): ChecklistMessage | null {
  if (!/^[a-z0-9_]+(\.[a-z0-9_]+)+$/.test(itemKey)) return null;
  for (const [pattern, message] of PATTERNS) {
    const m = pattern.exec(itemKey);
    if (m) return message(m);
  }
  return { key: `items.${itemKey}` };
}

/** The catalogue message of a zone key. */
export function zoneMessage(zone: string): ChecklistMessage | null {
  return /^[a-z_]+$/.test(zone) ? { key: `zones.${zone}` } : null;
}

/** True when `key` names one message of the Checklist catalogue in `locale` (not a group of them). */
export function hasChecklistMessage(locale: string | null | undefined, key: string): boolean {
  let node: unknown = MESSAGES[writingLocale(locale)].Checklist;
  for (const part of key.split('.')) {
    if (typeof node !== 'object' || node === null || !Object.hasOwn(node, part)) return false;
    node = (node as Record<string, unknown>)[part];
  }
  return typeof node === 'string';
}

function say(locale: string | null | undefined, message: ChecklistMessage | null, fallback: string) {
  if (!message || !hasChecklistMessage(locale, message.key)) return fallback;
  return translatorFor(locale, 'Checklist')(message.key, message.values);
}

/** An item's label in `locale`; `fallback` (the recorded English label, or the key) when the catalogue lacks it. */
export function itemLabel(locale: string | null | undefined, itemKey: string, fallback: string = itemKey) {
  return say(locale, itemMessage(itemKey), fallback);
}

/** A zone's label in `locale`; `fallback` when the catalogue lacks it. */
export function zoneLabel(locale: string | null | undefined, zone: string, fallback: string = zone) {
  return say(locale, zoneMessage(zone), fallback);
}

/** A checklist with its zone and item labels in `locale` (for a screen; the keys are unchanged). */
export function localizeChecklist<C extends { zones: ChecklistZone[] }>(
  checklist: C,
  locale: string | null | undefined,
): C {
  const item = (i: ChecklistItem): ChecklistItem => ({ ...i, label: itemLabel(locale, i.key, i.label) });
  return {
    ...checklist,
    zones: checklist.zones.map((z) => ({
      ...z,
      label: zoneLabel(locale, z.key, z.label),
      items: z.items.map(item),
    })),
  };
}
