import type { ItemKind } from './types';

/**
 * Which checklist items are safety items (common practice: the parts whose failure drops,
 * loosens or derails a trailer on the road, or spoils a load under way):
 * each tandem locking pin, the spare, every tire (air and tread), fuel tank leaks, the rear door
 * hinges and lock rods, the landing gear legs and cross shaft, and whether the reefer runs.
 */
export function isSafetyKey(key: string, kind: ItemKind): boolean {
  if (kind === 'pin' || kind === 'spare' || kind === 'tire' || kind === 'leak' || kind === 'hinge')
    return true;
  if (/^rear\.door_(left|right)\.lock_rods$/.test(key)) return true;
  if (key.startsWith('undercarriage.landing_gear.')) return true;
  return key === 'readings.unit_on';
}
