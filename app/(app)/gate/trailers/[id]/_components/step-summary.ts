import type { Draft } from '@/lib/handoffs/draft';
import type { StepKey } from '@/lib/handoffs/steps';

export const STEP_TITLES: Record<StepKey, string> = {
  who: 'Who and what',
  fuel: 'Fuel',
  reefer: 'Reefer readings',
  safety: 'Safety checks',
  rest: 'The rest of the box',
  confirm: 'Confirm',
};

const PRE_TRIP = { pass: 'pre-trip passed', fail: 'pre-trip failed', not_run: 'pre-trip not run' } as const;

/** The one line a folded step shows: the answers it holds, or what is still missing. */
export function stepSummary(
  step: StepKey,
  d: Draft,
  counts: { safety: [number, number]; rest: [number, number] },
): string {
  switch (step) {
    case 'who':
      return [
        d.tractorNumber || 'no tractor yet',
        d.isLoaded === null ? 'loaded or empty?' : d.isLoaded ? 'loaded' : 'empty',
      ].join(' · ');
    case 'fuel':
      return d.fuelEighths === null ? 'not read yet' : `${d.fuelEighths}/8`;
    case 'reefer':
      return [
        d.reefer.isUnitOn === null ? null : d.reefer.isUnitOn ? 'running' : 'off',
        d.reefer.preTripResult ? PRE_TRIP[d.reefer.preTripResult] : 'pre-trip?',
      ]
        .filter(Boolean)
        .join(' · ');
    case 'safety':
      return `${counts.safety[0]} of ${counts.safety[1]} answered`;
    case 'rest':
      return `${counts.rest[0]} of ${counts.rest[1]} checked`;
    case 'confirm':
      return '';
  }
}
