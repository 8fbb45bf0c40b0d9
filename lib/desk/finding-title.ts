// A finding's heading as a clerk reads it out: its kind, the item and the condition in words, in
// the reader's language (never a stored key such as `fuel_short` or `not_checked`). Pure.
import { findingWords } from '@/lib/handoffs/receipt';
import { itemLabel as itemWords } from '@/lib/i18n/checklist';
import { translatorFor } from '@/lib/i18n/translate';
import { itemLabel } from './item-labels';

export function findingTitle(
  f: { kind: string; itemKey: string; condition: string | null },
  locale: string = 'en',
): string {
  const mail = translatorFor(locale, 'Mail');
  const item = itemWords(locale, f.itemKey, itemLabel(f.itemKey));
  const condition =
    f.condition && mail.has(`condition.${f.condition}`) ? mail(`condition.${f.condition}`) : null;
  return `${findingWords(f.kind, locale)}: ${item}${condition ? ` — ${condition}` : ''}`;
}
