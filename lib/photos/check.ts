// Whether an uploaded photo is what its announcement promised. Pure.
import { createHash } from 'node:crypto';
import { MAX_PHOTO_BYTES, sniffImageType } from './image-type';

export type Announced = { contentType: string; byteSize: number; sha256: string };
export type UploadProblem = {
  code: 'too_large' | 'invalid' | 'unsupported_type';
  message: string;
};

/** The first thing wrong with the uploaded bytes (size, type by content, SHA-256), or null. */
export function uploadProblem(bytes: Uint8Array, announced: Announced): UploadProblem | null {
  if (bytes.length > MAX_PHOTO_BYTES)
    return { code: 'too_large', message: 'The photo is larger than allowed.' };
  if (bytes.length !== announced.byteSize)
    return { code: 'invalid', message: "The photo's size is not what was announced." };
  const sniffed = sniffImageType(bytes);
  if (sniffed === null)
    return { code: 'unsupported_type', message: 'That file is not a JPEG, PNG or WebP image.' };
  if (sniffed !== announced.contentType) {
    return {
      code: 'unsupported_type',
      message: `The file is a ${sniffed}, not the ${announced.contentType} announced.`,
    };
  }
  if (createHash('sha256').update(bytes).digest('hex') !== announced.sha256) {
    return {
      code: 'invalid',
      message: "The photo's checksum does not match; it was changed on the way. Take it again.",
    };
  }
  return null;
}

/** What re-reading a recorded photo from storage found. */
export type PhotoCheckOutcome = 'matches' | 'changed' | 'missing';

/**
 * Whether the bytes in storage are still the photo the record hashed: `missing` when nothing is
 * stored under its key, `changed` when the size or the SHA-256 (FIPS 180-4) differs.
 */
export function photoCheckOutcome(
  bytes: Uint8Array | null,
  recorded: { byteSize: number; sha256: string },
): PhotoCheckOutcome {
  if (bytes === null) return 'missing';
  if (bytes.length !== recorded.byteSize) return 'changed';
  return createHash('sha256').update(bytes).digest('hex') === recorded.sha256 ? 'matches' : 'changed';
}

/** How many photos came out each way. */
export function countOutcomes(outcomes: readonly PhotoCheckOutcome[]): Record<PhotoCheckOutcome, number> {
  const counts = { matches: 0, changed: 0, missing: 0 };
  for (const o of outcomes) counts[o]++;
  return counts;
}
