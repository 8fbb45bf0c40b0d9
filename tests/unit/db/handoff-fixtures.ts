// Helpers for the handoff database tests: a fresh trailer per test, the demo actors, a full
// inspection with every item ok. Not a test file (no .test.ts).
import { randomBytes, randomUUID } from 'node:crypto';
import { and, desc, eq, sql } from 'drizzle-orm';
import { db } from '@/db';
import { carriers, photos, trailers, users } from '@/db/schema';
import type { Checklist } from '@/lib/engine';
import { allOkObservations } from '@/lib/handoffs/all-ok';
import { isRefusal, type Refusal } from '@/lib/result';
import { submitHandoff, type HandoffActor } from '@/lib/server/handoffs/submit';
import { checklistOf } from '@/lib/trailers/checklist';
import type { HandoffSubmitInput, ItemObservationInput } from '@/lib/validation/handoffs';

export async function actor(driverNumberOrEmail: string): Promise<HandoffActor & { carrierName: string }> {
  const col = driverNumberOrEmail.includes('@') ? users.email : users.driverNumber;
  const [u] = await db
    .select({
      id: users.id,
      role: users.role,
      carrierId: users.carrierId,
      terminalId: users.homeTerminalId,
      carrierName: carriers.name,
    })
    .from(users)
    .innerJoin(carriers, eq(carriers.id, users.carrierId))
    .where(eq(col, driverNumberOrEmail));
  return u;
}

const taken = new Set<string>();
/**
 * A seeded trailer out on the road with no handoff history, not used by another test of this run.
 * Seeded trailers rather than new rows: the foundation test counts the seed's 300 trailers.
 */
export async function freshTrailer(kind: 'reefer' | 'dry_van' = 'reefer') {
  const rows = await db
    .select()
    .from(trailers)
    .where(
      and(
        eq(trailers.status, 'on_road'),
        eq(trailers.kind, kind),
        sql`not exists (select 1 from handoffs h where h.trailer_id = ${trailers.id})`,
      ),
    )
    .orderBy(desc(trailers.unitNumber));
  const t = rows.find((r) => !taken.has(r.id));
  if (!t) throw new Error('no unused on-road trailer left for this test run');
  taken.add(t.id);
  return { trailer: t, checklist: checklistOf(t) };
}

/** Every inspectable item ok, with the fields its kind requires (pins engaged, spare usable, 10/32 in tread). */
export const allOk = (checklist: Checklist) => allOkObservations(checklist);

export function submitInput(
  trailerId: string,
  carrierId: string,
  kind: 'drop' | 'hook',
  items: Record<string, ItemObservationInput>,
  at: Date,
  extra: Partial<HandoffSubmitInput> = {},
): HandoffSubmitInput {
  return {
    idempotencyKey: `test-${randomUUID()}`,
    trailerId,
    kind,
    carrierId,
    driverName: 'Test Driver',
    tractorNumber: 'TR-77',
    isLoaded: false,
    sealNumber: null,
    fuelEighths: 8,
    reefer: {
      isUnitOn: true,
      setpointF: 34,
      returnAirF: 36,
      engineHours: 1200,
      preTripResult: 'pass',
      preTripAt: new Date(at.getTime() - 3_600_000).toISOString(),
    },
    items,
    spotId: null,
    note: null,
    ...extra,
  };
}

/** A photo row already checked and stored (the upload checks are tested against the fake S3 elsewhere). */
export async function storedPhoto(
  trailerId: string,
  uploadedById: string,
  sha256 = randomBytes(32).toString('hex'),
) {
  const [p] = await db
    .insert(photos)
    .values({
      objectKey: `test/${randomUUID()}.png`,
      uploadedById,
      trailerId,
      status: 'stored',
      contentType: 'image/png',
      byteSize: 1234,
      sha256,
    })
    .returning({ id: photos.id });
  return p.id;
}

/** Submits a handoff the test expects recorded; a refusal fails the test with its reason. */
export async function recorded(...args: Parameters<typeof submitHandoff>) {
  const result = await submitHandoff(...args);
  if (!result.ok) throw new Error(`handoff refused (${result.code}): ${result.message}`);
  return result.value;
}

/** Submits a handoff the test expects refused, and returns the refusal. */
export async function refused(...args: Parameters<typeof submitHandoff>): Promise<Refusal> {
  const result = await submitHandoff(...args);
  if (!isRefusal(result)) throw new Error(`handoff recorded (${result.value.handoffId}), expected a refusal`);
  return result;
}
