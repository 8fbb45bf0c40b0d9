import { useLocale, useTranslations } from 'next-intl';
import { formatTime } from '@/lib/format/time';
import type { ChainCheck } from '@/lib/handoffs/hash';

/** Whether the trailer's handoff records still hash to what was stored when they were made. */
export function ChainStatus({
  check,
  brokenAt,
  timeZone,
}: {
  check: ChainCheck;
  brokenAt: Date | null;
  timeZone: string;
}) {
  const t = useTranslations('Trailers');
  const locale = useLocale();
  if (check.ok) {
    return (
      <p role="status" className="rounded-lg border-l-8 border-ok bg-ok-bg p-3 text-gate font-bold text-ok">
        {t('chain.ok', { count: check.count })}
      </p>
    );
  }
  return (
    <p
      role="alert"
      className="rounded-lg border-l-8 border-danger bg-danger-bg p-3 text-gate font-bold text-danger"
    >
      {t(
        check.why === 'unkeyed'
          ? 'chain.unkeyed'
          : check.why === 'link_broken'
            ? 'chain.linkBroken'
            : 'chain.changed',
        {
          when: brokenAt ? formatTime(brokenAt, timeZone, 'dateTime', locale) : t('chain.unknownDate'),
        },
      )}
    </p>
  );
}
