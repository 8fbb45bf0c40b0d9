// Photos cannot be swapped after the fact: the browser uploads to a pending key, completion writes
// the checked bytes to a final key no presigned URL names, and the photo check (trailer file and
// scripts/check-photos.ts) finds an object an attacker wrote straight into the store.
// Runs against the real local S3 fake (scripts/fakes.sh start; scripts/test.sh starts it).
import { execFile } from 'node:child_process';
import { createHash } from 'node:crypto';
import { promisify } from 'node:util';
import { eq } from 'drizzle-orm';
import { PNG } from 'pngjs';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { db, pool } from '@/db';
import { handoffs, photos, terminals } from '@/db/schema';
import { seed } from '@/db/seed';
import { completeUpload, createUpload, PENDING_PREFIX, PHOTO_PREFIX } from '@/lib/server/photos/uploads';
import { checkTerminalPhotos, checkTrailerPhotos } from '@/lib/server/photos/integrity';
import { putObject, readObject } from '@/lib/server/storage';
import { actor, allOk, freshTrailer, recorded, submitInput } from './handoff-fixtures';

const signedIn = vi.hoisted(() => ({ user: null as unknown }));
vi.mock('@/lib/server/auth', () => ({ currentUser: async () => signedIn.user }));
const { GET } = await import('@/app/api/photos/[id]/route');

const sha = (b: Uint8Array) => createHash('sha256').update(b).digest('hex');

/** A real PNG of one grey level (different levels give different bytes). */
function png(level: number): Uint8Array {
  const img = new PNG({ width: 8, height: 8 });
  img.data.fill(level);
  return new Uint8Array(PNG.sync.write(img));
}

async function served(photoId: string): Promise<Uint8Array> {
  const res = await GET(new Request(`http://localhost/api/photos/${photoId}`), {
    params: Promise.resolve({ id: photoId }),
  });
  expect(res.status).toBe(200);
  return new Uint8Array(await res.arrayBuffer());
}

describe('photos: pending key, final key, and the photo check', () => {
  let driver: Awaited<ReturnType<typeof actor>>;
  let terminalCode: string;

  beforeAll(async () => {
    await seed();
    driver = await actor('D1001');
    signedIn.user = {
      id: driver.id,
      role: 'driver',
      carrierId: driver.carrierId,
      terminalId: driver.terminalId,
    };
    const [t] = await db.select().from(terminals).where(eq(terminals.id, driver.terminalId!));
    terminalCode = t.code;
  });
  afterAll(async () => {
    await pool.end();
  });

  /** Announce, PUT with the presigned URL, complete: the photo id and the URL used. */
  async function upload(trailerId: string, bytes: Uint8Array) {
    const announced = await createUpload(
      {
        trailerId,
        itemKey: 'left_side.skin',
        contentType: 'image/png',
        byteSize: bytes.length,
        sha256: sha(bytes),
      },
      { id: driver.id },
    );
    if (!announced.ok) throw new Error(announced.message);
    if (!('uploadUrl' in announced.value)) throw new Error('a new photo is announced with an upload URL');
    const { photoId, uploadUrl, headers } = announced.value;
    const put = await fetch(uploadUrl, { method: 'PUT', headers, body: new Blob([new Uint8Array(bytes)]) });
    expect(put.status).toBe(200);
    const completed = await completeUpload(photoId, { id: driver.id });
    expect(completed.ok).toBe(true);
    return { photoId, uploadUrl, headers };
  }

  it('signs a 120-second URL for a pending key, bound to content type and length', async () => {
    const { trailer } = await freshTrailer();
    const bytes = png(90);
    const announced = await createUpload(
      {
        trailerId: trailer.id,
        itemKey: 'left_side.skin',
        contentType: 'image/png',
        byteSize: bytes.length,
        sha256: sha(bytes),
      },
      { id: driver.id },
    );
    if (!announced.ok) throw new Error(announced.message);
    if (!('uploadUrl' in announced.value)) throw new Error('a new photo is announced with an upload URL');
    const url = new URL(announced.value.uploadUrl);
    // AWS Signature Version 4, query-string form: X-Amz-Expires is the validity in seconds and
    // X-Amz-SignedHeaders lists the headers the signature covers (AWS S3 API reference,
    // "Authenticating Requests: Using Query Parameters").
    expect(url.searchParams.get('X-Amz-Expires')).toBe('120');
    expect(url.searchParams.get('X-Amz-SignedHeaders')?.split(';')).toEqual(
      expect.arrayContaining(['content-length', 'content-type', 'host']),
    );
    expect(url.pathname).toContain(`/${PENDING_PREFIX}`);
    const [row] = await db.select().from(photos).where(eq(photos.id, announced.value.photoId));
    expect(url.pathname).toContain(row.pendingKey!);
    expect(row.objectKey.startsWith(PHOTO_PREFIX)).toBe(true);
  });

  it('a second PUT to the old URL after completion changes neither the served bytes nor the hash', async () => {
    const { trailer, checklist } = await freshTrailer();
    const original = png(120);
    const { photoId, uploadUrl, headers } = await upload(trailer.id, original);
    // attach it to a recorded drop, as the gate does
    const items = allOk(checklist);
    items['left_side.skin'] = { condition: 'minor', note: 'Scrape', photoIds: [photoId] };
    await recorded(submitInput(trailer.id, driver.carrierId!, 'drop', items, new Date()), driver);

    const swap = png(30);
    const again = await fetch(uploadUrl, { method: 'PUT', headers, body: new Blob([new Uint8Array(swap)]) });
    expect(again.status).toBe(200); // the fake store takes it (the URL has not expired) ...

    const [row] = await db.select().from(photos).where(eq(photos.id, photoId));
    expect(row.sha256).toBe(sha(original));
    // ... but only onto the pending key, which nothing serves
    expect(await readObject(row.pendingKey!, 10_000)).toEqual(swap);
    expect(await served(photoId)).toEqual(original);
    const check = await checkTrailerPhotos(trailer.id);
    expect(check.photos.map((p) => [p.id, p.outcome])).toEqual([[photoId, 'matches']]);
    // completing again does not re-read the pending key
    expect(await completeUpload(photoId, { id: driver.id })).toEqual({
      ok: true,
      value: { photoId, status: 'stored' },
    });
    expect(await served(photoId)).toEqual(original);
  });

  it('an object swapped straight in the store is found by the trailer check and by the script', async () => {
    const { trailer, checklist } = await freshTrailer();
    const kept = png(200);
    const swapped = png(201);
    const gone = png(202);
    const a = await upload(trailer.id, kept);
    const b = await upload(trailer.id, swapped);
    const c = await upload(trailer.id, gone);
    const items = allOk(checklist);
    items['left_side.skin'] = {
      condition: 'minor',
      note: 'Three views',
      photoIds: [a.photoId, b.photoId, c.photoId],
    };
    const drop = await recorded(
      submitInput(trailer.id, driver.carrierId!, 'drop', items, new Date()),
      driver,
    );
    const [h] = await db.select().from(handoffs).where(eq(handoffs.id, drop.handoffId));
    expect(h.terminalId).toBe(driver.terminalId);

    const before = await checkTerminalPhotos(terminalCode);
    if (!before.ok) throw new Error(before.message);
    expect(before.value.counts.changed + before.value.counts.missing).toBe(0);

    // the attacker, holding storage credentials, overwrites one final object and deletes another
    const rows = await db.select().from(photos).where(eq(photos.handoffId, drop.handoffId));
    const keyOf = (id: string) => rows.find((r) => r.id === id)!.objectKey;
    await putObject(keyOf(b.photoId), png(30), 'image/png');
    const { deleteObject } = await import('@/lib/server/storage');
    await deleteObject(keyOf(c.photoId));

    const check = await checkTrailerPhotos(trailer.id);
    expect(Object.fromEntries(check.photos.map((p) => [p.id, p.outcome]))).toEqual({
      [a.photoId]: 'matches',
      [b.photoId]: 'changed',
      [c.photoId]: 'missing',
    });
    expect(check.counts).toEqual({ matches: 1, changed: 1, missing: 1 });

    const terminal = await checkTerminalPhotos(terminalCode);
    if (!terminal.ok) throw new Error(terminal.message);
    expect(terminal.value.counts.changed).toBe(1);
    expect(terminal.value.counts.missing).toBe(1);
    // the three matched before; one of them still does
    expect(terminal.value.counts.matches).toBe(before.value.counts.matches - 2);

    const run = await promisify(execFile)(
      'node_modules/.bin/tsx',
      ['--conditions=react-server', 'scripts/check-photos.ts', terminalCode],
      { env: process.env },
    ).then(
      (r) => ({ code: 0, out: r.stdout }),
      (e: { code: number; stdout: string }) => ({ code: e.code, out: e.stdout }),
    );
    expect(run.code).toBe(1);
    expect(run.out).toContain(`changed: photo ${b.photoId}`);
    expect(run.out).toContain(`missing: photo ${c.photoId}`);
    expect(run.out).toMatch(
      new RegExp(
        `${terminal.value.photos.length} photos checked, ${terminal.value.counts.matches} match, 1 changed, 1 missing`,
      ),
    );
  }, 60_000);

  it('the script refuses an unknown terminal code', async () => {
    const run = await promisify(execFile)(
      'node_modules/.bin/tsx',
      ['--conditions=react-server', 'scripts/check-photos.ts', 'NOPE'],
      { env: process.env },
    ).catch((e: { code: number; stderr: string }) => e);
    expect((run as { code: number }).code).toBe(2);
    expect((run as { stderr: string }).stderr).toContain('No terminal with code NOPE');
  });
});
