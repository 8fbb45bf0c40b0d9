import { useLocale, useTranslations } from 'next-intl';
import { formatTime } from '@/lib/format/time';
import { PhotoZoom } from './photo-zoom';

type Event = {
  id: string;
  kind: string;
  fromState: string | null;
  toState: string | null;
  note: string | null;
  createdAt: Date;
  actorName: string | null;
  actorRole: string | null;
  photoIds: string[];
};

const KINDS = ['opened', 'estimated', 'notify', 'dispute', 'decide', 'close', 'override'] as const;
const isKnown = (kind: string): kind is (typeof KINDS)[number] => (KINDS as readonly string[]).includes(kind);

export function CaseHistory({ events, timeZone }: { events: Event[]; timeZone: string }) {
  const t = useTranslations('Case');
  const locale = useLocale();
  return (
    <ol className="space-y-2" aria-label={t('historyLabel')}>
      {events.map((e) => (
        <li key={e.id} className="rounded-lg bg-paper p-2 text-gate-sm">
          <span className="font-bold">{isKnown(e.kind) ? t(`event.${e.kind}`) : e.kind}</span> ·{' '}
          {formatTime(e.createdAt, timeZone, 'dateTime', locale)}
          {e.actorName
            ? ` · ${e.actorName} (${e.actorRole})`
            : e.kind === 'dispute'
              ? ` · ${t('viaLink')}`
              : ''}
          {/* the event's note is stored text, shown as it was written */}
          {e.note ? (
            <p className="mt-1 text-ink-soft" data-stored-text="">
              {e.note}
            </p>
          ) : null}
          {e.photoIds.length ? (
            <div className="mt-2 grid grid-cols-2 gap-2">
              {e.photoIds.map((id) => (
                <PhotoZoom key={id} photoId={id} alt={t('disputePhoto')} />
              ))}
            </div>
          ) : null}
        </li>
      ))}
    </ol>
  );
}
