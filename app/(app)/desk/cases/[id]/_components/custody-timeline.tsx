import { useLocale, useTranslations } from 'next-intl';
import type { CustodyEvent } from '@/lib/desk/custody';
import { formatTime } from '@/lib/format/time';

type Event = CustodyEvent;

/** Who held the trailer between the earlier inspection and this one. */
export function CustodyTimeline({ events, timeZone }: { events: Event[]; timeZone: string }) {
  const t = useTranslations('Case');
  const locale = useLocale();
  if (events.length === 0) return <p className="text-gate-sm text-ink-soft">{t('noCustody')}</p>;
  return (
    <ol className="relative space-y-3 border-l-4 border-brand pl-4" aria-label={t('custody')}>
      {events.map((e) => (
        <li key={e.id} className="text-gate-sm">
          <span className="font-bold">{formatTime(e.at, timeZone, 'dateTime', locale)}</span> —{' '}
          {t(`custodyEvent.${e.kind}`, e.values)}
        </li>
      ))}
    </ol>
  );
}
