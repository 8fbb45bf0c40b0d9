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
