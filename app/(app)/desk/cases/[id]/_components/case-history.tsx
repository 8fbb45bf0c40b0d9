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

const WORDS: Record<string, string> = {
  opened: 'Opened',
  estimated: 'Estimated',
  notify: 'Carrier notified',
  dispute: 'Disputed',
  decide: 'Decided',
  close: 'Closed',
  override: 'Estimate changed',
};

export function CaseHistory({ events, timeZone }: { events: Event[]; timeZone: string }) {
  return (
    <ol className="space-y-2" aria-label="Case history">
      {events.map((e) => (
        <li key={e.id} className="rounded-lg bg-paper p-2 text-gate-sm">
          <span className="font-bold">{WORDS[e.kind] ?? e.kind}</span> · {formatTime(e.createdAt, timeZone)}
          {e.actorName
            ? ` · ${e.actorName} (${e.actorRole})`
            : e.kind === 'dispute'
              ? ' · via the e-mailed link'
              : ''}
          {e.note ? <p className="mt-1 text-ink-soft">{e.note}</p> : null}
          {e.photoIds.length ? (
            <div className="mt-2 grid grid-cols-2 gap-2">
              {e.photoIds.map((id) => (
                <PhotoZoom key={id} photoId={id} alt="Photo sent with the dispute" />
              ))}
            </div>
          ) : null}
        </li>
      ))}
    </ol>
  );
}
