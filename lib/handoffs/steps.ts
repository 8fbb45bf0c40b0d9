// The gate form's steps: which exist for a trailer, when each is answered, and where an error
// sends the driver. Pure: the form (app/(app)/gate/trailers/[id]) and its tests read it.
import type { Draft } from './draft';

export const STEP_KEYS = ['who', 'fuel', 'reefer', 'safety', 'rest', 'confirm'] as const;
export type StepKey = (typeof STEP_KEYS)[number];

/** What the step rules need to know of the trailer's checklist. */
export type StepContext = {
  isReefer: boolean;
  /** Keys of the safety items (never copied; answered in the safety step). */
  safetyKeys: readonly string[];
  /** Keys of the other inspected items (the rest of the box). */
  otherKeys: readonly string[];
  /** A hook of a "no perishable loads" trailer asks about the load in the first step. */
  asksPerishable: boolean;
};

/** The steps of this handoff, in order: fuel and reefer readings for a reefer only. */
export function gateSteps(isReefer: boolean): StepKey[] {
  return STEP_KEYS.filter((k) => isReefer || (k !== 'fuel' && k !== 'reefer'));
}

const answered = (d: Draft, keys: readonly string[]) => keys.every((k) => Boolean(d.items[k]?.condition));

/** True when every answer the step asks for is given (optional fields may stay empty). */
export function isStepComplete(step: StepKey, d: Draft, ctx: StepContext): boolean {
  switch (step) {
    case 'who':
      return (
        d.carrierId !== '' &&
        d.driverName.trim().length >= 2 &&
        d.tractorNumber.trim() !== '' &&
        d.isLoaded !== null &&
        (!ctx.asksPerishable || (d.isLoadPerishable !== null && d.isLoadPerishable !== undefined))
      );
    case 'fuel':
      return d.fuelEighths !== null;
    case 'reefer':
      return (
        d.reefer.preTripResult !== null && (d.reefer.preTripResult === 'not_run' || d.reefer.preTripAt !== '')
      );
    case 'safety':
      return answered(d, ctx.safetyKeys);
    case 'rest':
      return answered(d, ctx.otherKeys);
    case 'confirm':
      return false;
  }
}

const WHO_FIELDS = new Set([
  'carrierId',
  'driverName',
  'tractorNumber',
  'isLoaded',
  'sealNumber',
  'isLoadPerishable',
  'kind',
  'trailerId',
]);

/** The step that shows a field's message (`items.<key>` goes by whether the item is a safety item). */
export function stepOfField(field: string, ctx: Pick<StepContext, 'safetyKeys'>): StepKey {
  const top = field.split('.')[0];
  if (WHO_FIELDS.has(top)) return 'who';
  if (top === 'fuelEighths') return 'fuel';
  if (top === 'reefer') return 'reefer';
  if (top === 'items') {
    const key = field.slice('items.'.length);
    return ctx.safetyKeys.some((k) => key === k || key.startsWith(`${k}.`)) ? 'safety' : 'rest';
  }
  return 'confirm';
}

/** The first step, in the form's order, holding a field with a message; null when none has one. */
export function firstStepWithError(
  steps: readonly StepKey[],
  errors: Record<string, string[] | undefined>,
  ctx: Pick<StepContext, 'safetyKeys'>,
): StepKey | null {
  const withError = new Set(
    Object.entries(errors)
      .filter(([, m]) => m?.length)
      .map(([f]) => stepOfField(f, ctx)),
  );
  return steps.find((s) => withError.has(s)) ?? null;
}

/**
 * Field messages keyed the way the form shows them: a message under an item's own field
 * (`items.tires.left_outer.treadThirtySeconds` from the server) is filed under the item
 * (`items.tires.left_outer`); the bare `items` and `reefer` summaries give way to the precise ones.
 */
export function errorsByField(
  errors: Record<string, string[] | undefined>,
  itemKeys: readonly string[],
): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  const add = (k: string, list: string[]) => {
    const to = (out[k] ??= []);
    for (const m of list) if (!to.includes(m)) to.push(m);
  };
  const byLength = [...itemKeys].sort((a, b) => b.length - a.length);
  for (const [field, list] of Object.entries(errors)) {
    if (!list?.length) continue;
    if (field.startsWith('items.')) {
      const rest = field.slice('items.'.length);
      const key = byLength.find((k) => rest === k || rest.startsWith(`${k}.`));
      add(key ? `items.${key}` : field, list);
    } else add(field, list);
  }
  for (const parent of ['items', 'reefer']) {
    if (out[parent] && Object.keys(out).some((k) => k.startsWith(`${parent}.`))) delete out[parent];
  }
  return out;
}

/** The step after `step`, or the same step when it is the last. */
export function nextStep(steps: readonly StepKey[], step: StepKey): StepKey {
  const i = steps.indexOf(step);
  return steps[Math.min(i + 1, steps.length - 1)] ?? step;
}
