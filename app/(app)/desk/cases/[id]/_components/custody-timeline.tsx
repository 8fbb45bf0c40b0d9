import { formatTime } from '@/lib/format/time';

type Event = { id: string; at: Date; kind: string; text: string };

/** Who held the trailer between the earlier inspection and this one. */
export function CustodyTimeline({ events, timeZone }: { events: Event[]; timeZone: string }) {
  if (events.length === 0)
    return (
      <p className="text-gate-sm text-ink-soft">
        No earlier inspection of these items, so there is no custody interval to show.
      </p>
    );
  return (
    <ol
      className="relative space-y-3 border-l-4 border-brand pl-4"
      aria-label="Custody between the two inspections"
    >
      {events.map((e) => (
        <li key={e.id} className="text-gate-sm">
          <span className="font-bold">{formatTime(e.at, timeZone)}</span> — {e.text}
        </li>
      ))}
    </ol>
  );
}
