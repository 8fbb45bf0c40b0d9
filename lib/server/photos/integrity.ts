// Re-reads recorded photos from storage and compares each with the size and SHA-256 the record
// holds. The handoff chain hashes those same SHA-256 values, so "chain verifies" plus "every photo
// matches" means the pictures served are the ones receipted. Used by the trailer file's
// "Check the photos" and by scripts/check-photos.ts for a whole terminal.
import 'server-only';
import { listRecordedPhotos } from '@/db/queries/photos';
import { getTerminalByCode } from '@/db/queries/terminals';
import { countOutcomes, photoCheckOutcome, type PhotoCheckOutcome } from '@/lib/photos/check';
import { MAX_PHOTO_BYTES } from '@/lib/photos/image-type';
import { done, refuse, type Result } from '@/lib/result';
import { readObject } from '../storage';

type Recorded = Awaited<ReturnType<typeof listRecordedPhotos>>[number];
export type PhotoCheck = Omit<Recorded, 'objectKey'> & { outcome: PhotoCheckOutcome };
export type PhotoCheckReport = {
  photos: PhotoCheck[];
  counts: Record<PhotoCheckOutcome, number>;
};

/** Photos read a few at a time: storage answers each read on its own connection. */
const AT_ONCE = 4;

async function checkAll(recorded: Recorded[]): Promise<PhotoCheckReport> {
  const out: PhotoCheck[] = new Array(recorded.length);
  let next = 0;
  const worker = async () => {
    while (next < recorded.length) {
      const i = next++;
      const { objectKey, ...photo } = recorded[i];
      // one byte past the recorded size is enough to tell a longer object apart
      const bytes = await readObject(objectKey, Math.min(photo.byteSize, MAX_PHOTO_BYTES));
      out[i] = { ...photo, outcome: photoCheckOutcome(bytes, photo) };
    }
  };
  await Promise.all(Array.from({ length: Math.min(AT_ONCE, recorded.length) }, worker));
  return { photos: out, counts: countOutcomes(out.map((p) => p.outcome)) };
}

/** Every recorded photo of one trailer, re-hashed. */
export async function checkTrailerPhotos(trailerId: string): Promise<PhotoCheckReport> {
  return checkAll(await listRecordedPhotos({ trailerId }));
}

/** Every recorded photo of the handoffs made at a terminal, re-hashed. */
export async function checkTerminalPhotos(
  terminalCode: string,
): Promise<Result<PhotoCheckReport & { terminal: { code: string; name: string } }>> {
  const terminal = await getTerminalByCode(terminalCode);
  if (!terminal) return refuse('not_found', `No terminal with code ${terminalCode}.`);
  const report = await checkAll(await listRecordedPhotos({ terminalId: terminal.id }));
  return done({ ...report, terminal: { code: terminal.code, name: terminal.name } });
}
