import 'server-only';
import { eq } from 'drizzle-orm';
import { db } from '@/db';
import { policies } from '@/db/schema';
import { DEFAULT_PHOTO_POLICY, type PhotoPolicy } from '@/lib/photos/policy';
import { terminalPolicyOf } from '@/lib/terminal/policy';

/** How the phones of a terminal shrink photos: its policy row's figures, or the defaults. */
export async function getPhotoPolicy(terminalId: string | null): Promise<PhotoPolicy> {
  if (!terminalId) return DEFAULT_PHOTO_POLICY;
  const [row] = await db
    .select({ data: policies.data })
    .from(policies)
    .where(eq(policies.terminalId, terminalId));
  return terminalPolicyOf(row?.data ?? null).photo;
}
