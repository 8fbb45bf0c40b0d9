import type { Draft } from '@/lib/handoffs/draft';
import type { StepKey } from '@/lib/handoffs/steps';

type Say = (key: string, values?: Record<string, string | number>) => string;

const PRE_TRIP = { pass: 'preTripPass', fail: 'preTripFail', not_run: 'preTripNotRun' } as const;

/** The one line a folded step shows: the answers it holds, or what is still missing (Handoff.summary). */
export function stepSummary(
  step: StepKey,
  d: Draft,
  counts: { safety: [number, number]; rest: [number, number] },
  t: Say,
): string {
  switch (step) {
    case 'who':
      return [
        d.tractorNumber || t('noTractor'),
        t(d.isLoaded === null ? 'loadedOrEmpty' : d.isLoaded ? 'loaded' : 'empty'),
      ].join(' · ');
    case 'fuel':
      return d.fuelEighths === null ? t('fuelNotRead') : `${d.fuelEighths}/8`;
    case 'reefer':
      return [
        d.reefer.isUnitOn === null ? null : t(d.reefer.isUnitOn ? 'running' : 'off'),
        t(d.reefer.preTripResult ? PRE_TRIP[d.reefer.preTripResult] : 'preTripMissing'),
      ]
        .filter(Boolean)
        .join(' · ');
    case 'safety':
      return t('answered', { done: counts.safety[0], total: counts.safety[1] });
    case 'rest':
      return t('checked', { done: counts.rest[0], total: counts.rest[1] });
    case 'confirm':
      return '';
  }
}
