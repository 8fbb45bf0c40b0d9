// Which findings are damage a carrier may be charged for: new or worse, and past cosmetic.
// `minor` is cosmetic and acceptable (docs/sources.md); small scratches are acceptable (common practice),
// so a mark that only became `minor` is recorded and compared but needs no photo and opens no case.
import { severityOf, type Condition, type FindingKind } from '@/lib/engine';

const MINOR = severityOf('minor') ?? 1;

export function isChargeableDamage(
  kind: FindingKind | string,
  current: Condition | null | undefined,
): boolean {
  if (kind !== 'new' && kind !== 'worse') return false;
  const s = current ? severityOf(current) : null;
  return s !== null && s > MINOR;
}

/** How a case with damage no earlier inspection saw is marked: followed, never attributed. */
export const NOT_ATTRIBUTED_NOTE = 'no earlier inspection: not attributed';

/**
 * Damage past cosmetic found at an item's first inspection on record: nobody can be charged
 * for it, but it opens a case so the repair and the hold are followed.
 */
export function isUnattributedDamage(
  kind: FindingKind | string,
  current: Condition | null | undefined,
): boolean {
  if (kind !== 'first_record') return false;
  const s = current ? severityOf(current) : null;
  return s !== null && s > MINOR;
}
