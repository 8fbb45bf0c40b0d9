import { useTranslations } from 'next-intl';
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

const GROUPS = ['wrong_slot', 'missing', 'unknown', 'duplicate', 'matched'] as const;

type T = ReturnType<typeof useTranslations<'Walk'>>;

function describe(t: T, o: Outcome): string {
  const unit = o.unitNumber ?? o.scannedText ?? t('result.unknownUnit');
  const found = o.foundLabel ?? '';
  const expected = o.expectedLabel ?? '';
  switch (o.outcome) {
    case 'matched':
      return t('result.matched', { unit, found });
    case 'wrong_slot':
      return t('result.wrongSlot', { unit, expected, found });
    case 'missing':
      return t('result.missing', { unit, expected });
    case 'unknown':
      return t('result.unknown', { unit, found: o.foundLabel ?? t('result.unknownPlace') });
    case 'duplicate':
      return t('result.duplicate', { unit, found });
  }
}

function Resolve({ o }: { o: Outcome }) {
  const t = useTranslations('Walk');
  if (o.outcome === 'matched') return null;
  if (o.resolution)
    return <p className="text-gate-sm font-bold text-ok">{t(`result.resolution.${o.resolution}`)}</p>;
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
      {o.outcome === 'wrong_slot'
        ? choice('accepted', t('result.accept', { found: o.foundLabel ?? '' }), 'primary')
        : null}
      {o.outcome === 'missing' ? choice('marked_gone', t('result.markGone'), 'danger') : null}
      {choice('investigating', t('result.investigate'), 'secondary')}
    </div>
  );
}

/** The stored reconciliation of a finished walk, with what the clerk or jockey can do about each line. */
export function WalkResult({ summary, outcomes }: { summary: Record<string, number>; outcomes: Outcome[] }) {
  const t = useTranslations('Walk');
  return (
    <section aria-labelledby="result-title" className="space-y-3">
      <h2 id="result-title" className="text-gate-lg font-bold">
        {t('result.title')}
      </h2>
      <dl className="grid grid-cols-2 gap-2 sm:grid-cols-5" aria-label={t('result.counts')}>
        {GROUPS.map((g) => (
          <div key={g} className="rounded-lg bg-paper p-2 text-center shadow">
            <dt className="text-gate-sm">{t(`result.group.${g}`)}</dt>
            <dd className="text-gate-xl font-bold" data-testid={`count-${g}`}>
              {summary[g] ?? 0}
            </dd>
          </div>
        ))}
      </dl>
      <p className="text-gate-sm text-ink-soft">
        {t('result.scans', { count: summary.scans ?? 0 })}
        {summary.repeatScans ? `, ${t('result.repeated', { count: summary.repeatScans })}` : ''}.
      </p>
      {GROUPS.map((key) => {
        const g = { key, title: t(`result.group.${key}`) };
        const list = outcomes.filter((o) => o.outcome === g.key);
        if (list.length === 0) return null;
        const items = (
          <ul className="space-y-2">
            {list.map((o) => (
              <li key={o.id} className="rounded-lg bg-paper p-3 shadow">
                <p className="text-gate">{describe(t, o)}</p>
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
