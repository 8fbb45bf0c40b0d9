import { useTranslations } from 'next-intl';

/** The reference of a logged server error, for the terminal office to quote. */
export function ErrorDigest({ digest }: { digest?: string }) {
  const t = useTranslations('Errors');
  if (!digest) return null;
  return <p className="mt-2 text-gate-sm text-ink-soft">{t('reference', { digest })}</p>;
}
