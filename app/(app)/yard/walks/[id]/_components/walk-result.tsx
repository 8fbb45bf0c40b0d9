import { ActionForm } from '@/app/_components/action-form';
import type { WalkResolution } from '@/lib/yard/walk';
import { resolveOutcomeAction } from '../../actions';

type Outcome = {
  id: string;
  outcome: 'matched' | 'wrong_slot' | 'missing' | 'unknown' | 'duplicate';
  resolution: WalkResolution | null;
  scannedText: string | null;
  unitNumber: string | null;
  foundLabel: string | null;
  expectedLabel: string | null;
};

const GROUPS = [
  { key: 'wrong_slot', title: 'Wrong slot' },
  { key: 'missing', title: 'Missing' },
  { key: 'unknown', title: 'Unknown' },
  { key: 'duplicate', title: 'Duplicates' },
  { key: 'matched', title: 'Matched' },
] as const;

const RESOLUTION_TEXT: Record<WalkResolution, string> = {
  accepted: 'Board corrected',
  marked_gone: 'Marked gone',
  investigating: 'Under investigation',
};

function describe(o: Outcome): string {
  const unit = o.unitNumber ?? o.scannedText ?? 'Unknown';
  switch (o.outcome) {
    case 'matched':
      return `${unit} in ${o.foundLabel}`;
    case 'wrong_slot':
      return `${unit}: board says ${o.expectedLabel}, seen in ${o.foundLabel}`;
    case 'missing':
      return `${unit}: expected in ${o.expectedLabel}, not found`;
    case 'unknown':
      return `"${unit}" seen in ${o.foundLabel ?? 'an unknown place'}: not on this board`;
    case 'duplicate':
      return `${unit}: scanned in more than one slot (first ${o.foundLabel})`;
  }
}

function Resolve({ o }: { o: Outcome }) {
  if (o.outcome === 'matched') return null;
  if (o.resolution) return <p className="text-gate-sm font-bold text-ok">{RESOLUTION_TEXT[o.resolution]}</p>;
  const choice = (resolution: WalkResolution, label: string, variant: 'primary' | 'secondary' | 'danger') => (
    <ActionForm
      key={resolution}
      action={resolveOutcomeAction}
      submitLabel={label}
      variant={variant}
      hidden={{ outcomeId: o.id, resolution }}
    />
  );
  return (
    <div className="flex flex-wrap gap-2">
      {o.outcome === 'wrong_slot' ? choice('accepted', `Accept: move to ${o.foundLabel}`, 'primary') : null}
      {o.outcome === 'missing' ? choice('marked_gone', 'Mark gone', 'danger') : null}
      {choice('investigating', 'Investigate', 'secondary')}
    </div>
  );
}

/** The stored reconciliation of a finished walk, with what the clerk or jockey can do about each line. */
export function WalkResult({ summary, outcomes }: { summary: Record<string, number>; outcomes: Outcome[] }) {
  return (
    <section aria-labelledby="result-title" className="space-y-3">
      <h2 id="result-title" className="text-gate-lg font-bold">
        Reconciliation
      </h2>
      <dl className="grid grid-cols-2 gap-2 sm:grid-cols-5" aria-label="Counts">
        {GROUPS.map((g) => (
          <div key={g.key} className="rounded-lg bg-paper p-2 text-center shadow">
            <dt className="text-gate-sm">{g.title}</dt>
            <dd className="text-gate-xl font-bold" data-testid={`count-${g.key}`}>
              {summary[g.key] ?? 0}
            </dd>
          </div>
        ))}
      </dl>
      <p className="text-gate-sm text-ink-soft">
        {summary.scans ?? 0} scans{summary.repeatScans ? `, ${summary.repeatScans} repeated` : ''}.
      </p>
      {GROUPS.map((g) => {
        const list = outcomes.filter((o) => o.outcome === g.key);
        if (list.length === 0) return null;
        const items = (
          <ul className="space-y-2">
            {list.map((o) => (
              <li key={o.id} className="rounded-lg bg-paper p-3 shadow">
                <p className="text-gate">{describe(o)}</p>
                <Resolve o={o} />
              </li>
            ))}
          </ul>
        );
        // matched trailers need nothing done: folded away so the problems come first
        return g.key === 'matched' ? (
          <details key={g.key}>
            <summary className="min-h-tap cursor-pointer py-2 text-gate font-bold">
              {g.title} ({list.length})
            </summary>
            {items}
          </details>
        ) : (
          <section key={g.key} aria-label={g.title} className="space-y-2">
            <h3 className="text-gate font-bold">
              {g.title} ({list.length})
            </h3>
            {items}
          </section>
        );
      })}
    </section>
  );
}
