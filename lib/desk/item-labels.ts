// Readable labels and zones for stored item keys, taken from the engine's checklist so the desk
// says exactly what the gate form said.
import { buildChecklist } from '@/lib/engine';
import type { ZoneKey } from '@/lib/engine/types';

const known = new Map<string, { label: string; zone: ZoneKey }>();
for (const tireLayout of ['dual', 'wide_single'] as const) {
  for (const item of buildChecklist({ kind: 'reefer', hingesPerDoor: 5, axles: 3, tireLayout }).items) {
    known.set(item.key, { label: item.label, zone: item.zone });
  }
}

export function itemLabel(itemKey: string): string {
  return known.get(itemKey)?.label ?? itemKey;
}

/** The zone of an item: the checklist's, else the first segment of the key. */
export function itemZone(itemKey: string): string {
  return known.get(itemKey)?.zone ?? itemKey.split('.')[0];
}
