// A JPEG whose only content is its Exif segment, written byte by byte per EXIF 2.3
// (CIPA DC-008-2012): §4.5.4 APP1 marker FFE1 with the "Exif\0\0" identifier, §4.6.2 the TIFF
// header (byte order "II", 42, offset of IFD0), §4.6.3 the Exif IFD pointer (tag 0x8769, LONG)
// in IFD0, and in the Exif IFD DateTimeOriginal (0x9003, ASCII, 20 bytes with its NUL) and,
// from EXIF 2.31, OffsetTimeOriginal (0x9011, ASCII, 7 bytes). JPEG markers per ITU-T T.81 B.1:
// SOI FFD8 first, EOI FFD9 last.

function ascii(text: string): number[] {
  return [...text].map((c) => c.charCodeAt(0)).concat(0);
}

export function jpegWithExif(dateTimeOriginal: string, offsetTimeOriginal?: string): Uint8Array {
  const le16 = (n: number) => [n & 0xff, (n >> 8) & 0xff];
  const le32 = (n: number) => [n & 0xff, (n >> 8) & 0xff, (n >> 16) & 0xff, (n >>> 24) & 0xff];
  const entry = (tag: number, type: number, count: number, value: number[]) => [
    ...le16(tag),
    ...le16(type),
    ...le32(count),
    ...value,
  ];
  const ASCII = 2;
  const LONG = 4;
  const dt = ascii(dateTimeOriginal);
  const off = offsetTimeOriginal ? ascii(offsetTimeOriginal) : null;

  // offsets count from the start of the TIFF header
  const ifd0At = 8;
  const ifd0Size = 2 + 12 + 4;
  const exifAt = ifd0At + ifd0Size;
  const exifCount = off ? 2 : 1;
  const exifSize = 2 + 12 * exifCount + 4;
  const dtAt = exifAt + exifSize;
  const offAt = dtAt + dt.length;

  const tiff = [
    0x49,
    0x49,
    ...le16(42),
    ...le32(ifd0At),
    ...le16(1),
    ...entry(0x8769, LONG, 1, le32(exifAt)),
    ...le32(0),
    ...le16(exifCount),
    ...entry(0x9003, ASCII, dt.length, le32(dtAt)),
    ...(off
      ? entry(0x9011, ASCII, off.length, off.length <= 4 ? [...off, 0, 0, 0, 0].slice(0, 4) : le32(offAt))
      : []),
    ...le32(0),
    ...dt,
    ...(off ?? []),
  ];
  const payload = [...ascii('Exif'), 0, ...tiff];
  const length = payload.length + 2;
  return Uint8Array.from([
    0xff,
    0xd8,
    0xff,
    0xe1,
    (length >> 8) & 0xff,
    length & 0xff,
    ...payload,
    0xff,
    0xd9,
  ]);
}
