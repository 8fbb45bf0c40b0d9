import 'server-only';
import { getTranslations } from 'next-intl/server';
import { localizeRefusal } from '@/lib/i18n/refusals';

/** Says a service's or schema's English message in the reader's language, when the catalogue knows it. */
export async function refusalSayer(): Promise<(message: string) => string> {
  const t = await getTranslations('Refusals');
  return (message) => localizeRefusal(message, (key, values) => t(key, values));
}
