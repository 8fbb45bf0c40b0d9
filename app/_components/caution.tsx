import { useTranslations } from 'next-intl';
import enCautions from '@/lib/i18n/messages/en/Cautions.json';

/**
 * Safety cautions of the trade (common practice), shown where someone could get hurt. Wording is
 * Hitchmark's own; local codes, company policy and licensed mechanics decide. Screens take them
 * from the `Cautions` namespace in the reader's language; this is the English catalogue itself,
 * kept for the texts that are English by design (e-mails until they are translated).
 */
export const CAUTIONS: Omit<typeof enCautions, 'title' | 'titles'> = enCautions;

export function Caution({ children, title }: { children: React.ReactNode; title?: string }) {
  const t = useTranslations('Cautions');
  const heading = title ?? t('title');
  return (
    <aside
      role="note"
      aria-label={heading}
      className="rounded-lg border-l-8 border-warn bg-warn-bg p-3 text-gate text-ink"
    >
      <p className="font-bold">⚠ {heading}</p>
      <div className="mt-1">{children}</div>
    </aside>
  );
}
