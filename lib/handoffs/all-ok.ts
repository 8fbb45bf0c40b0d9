// A whole trailer recorded in good order: every inspectable item ok, with the answers its kind
// asks for (pins engaged, spare usable, hinges locking, no insulation showing, no leak, clean).
// Used by the demo seed and the tests to build handoffs; a real handoff is what the driver saw.
import type { Checklist } from '@/lib/engine';
import type { ItemObservationInput } from '@/lib/validation/handoffs';

/** `treadFor` gives each tire's tread in 32nds of an inch (default 10/32). */
export function allOkObservations(
  checklist: Checklist,
  treadFor: (itemKey: string) => number = () => 10,
): Record<string, ItemObservationInput> {
  const out: Record<string, ItemObservationInput> = {};
  for (const i of checklist.items) {
    if (i.kind === 'reading') continue;
    const o: ItemObservationInput = { condition: 'ok' };
    if (i.kind === 'pin') o.isEngaged = true;
    if (i.kind === 'spare') Object.assign(o, { isMounted: true, isHoldingAir: true });
    if (i.kind === 'tire') Object.assign(o, { treadThirtySeconds: treadFor(i.key), isHoldingAir: true });
    if (i.kind === 'hinge') o.isLocking = true;
    if (i.kind === 'skin') o.isInsulationShowing = false;
    if (i.kind === 'leak') o.isLeaking = false;
    if (i.kind === 'cleanliness') o.cleanliness = 'clean';
    out[i.key] = o;
  }
  return out;
}
