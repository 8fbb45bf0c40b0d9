// What the gate form asks of each item kind, and which items are compared between inspections.
import type { Checklist, ChecklistItem, ItemKind, ItemObservation } from './types';

/** The observation fields the gate form asks for each item kind, besides `condition`. */
export const OBSERVATION_FIELDS: Record<ItemKind, readonly (keyof ItemObservation)[]> = {
  condition: [],
  skin: ['isInsulationShowing'],
  hinge: ['isLocking'],
  pin: ['isEngaged'],
  spare: ['isMounted', 'isHoldingAir'],
  tire: ['treadThirtySeconds', 'isHoldingAir'],
  leak: ['isLeaking'],
  cleanliness: ['cleanliness'],
  reading: [],
};

/** Items whose condition is compared between inspections (every kind except readings). */
export function inspectableItems(checklist: Checklist): ChecklistItem[] {
  return checklist.items.filter((i) => i.kind !== 'reading');
}
