// Image type by content, never by file name or the declared type. Pure.

export const ALLOWED_IMAGE_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
export type ImageType = (typeof ALLOWED_IMAGE_TYPES)[number];
/** Largest photo accepted after the browser's resize (a 1600 px JPEG is far smaller). */
export const MAX_PHOTO_BYTES = 8 * 1024 * 1024;

export function isAllowedImageType(t: string): t is ImageType {
  return (ALLOWED_IMAGE_TYPES as readonly string[]).includes(t);
}

const starts = (b: Uint8Array, sig: number[], at = 0) =>
  b.length >= at + sig.length && sig.every((v, i) => b[at + i] === v);

/**
 * JPEG: SOI marker FF D8 then a marker FF; PNG: the 8-byte signature 89 50 4E 47 0D 0A 1A 0A;
 * WebP: "RIFF", a 4-byte size, "WEBP". Anything else is null.
 */
export function sniffImageType(bytes: Uint8Array): ImageType | null {
  if (starts(bytes, [0xff, 0xd8, 0xff])) return 'image/jpeg';
  if (starts(bytes, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return 'image/png';
  if (starts(bytes, [0x52, 0x49, 0x46, 0x46]) && starts(bytes, [0x57, 0x45, 0x42, 0x50], 8))
    return 'image/webp';
  return null;
}
