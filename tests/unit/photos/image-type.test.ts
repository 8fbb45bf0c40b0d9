import { PNG } from 'pngjs';
import { describe, expect, it } from 'vitest';
import { sniffImageType } from '@/lib/photos/image-type';

const bytes = (...b: number[]) => new Uint8Array(b);

describe('image type by content', () => {
  it('recognises a PNG made by an independent encoder (pngjs)', () => {
    // PNG signature 89 50 4E 47 0D 0A 1A 0A: PNG specification (ISO/IEC 15948, W3C PNG 3rd ed.) §5.2
    const png = new Uint8Array(PNG.sync.write(new PNG({ width: 2, height: 2 })));
    expect(sniffImageType(png)).toBe('image/png');
  });

  it('recognises JPEG by its SOI marker followed by another marker', () => {
    // SOI = FF D8, every marker starts with FF: ITU-T T.81 (ISO/IEC 10918-1) Annex B.1 (annex number from memory)
    expect(sniffImageType(bytes(0xff, 0xd8, 0xff, 0xe0, 0, 16, 0x4a, 0x46, 0x49, 0x46))).toBe('image/jpeg');
    expect(sniffImageType(bytes(0xff, 0xd8, 0x00))).toBeNull();
  });

  it('recognises WebP by its RIFF header and WEBP form type', () => {
    // 'RIFF' <size, 4 bytes LE> 'WEBP': RFC 9649 (WebP Image Format), RIFF file header (section number not cited: from memory)
    const webp = bytes(0x52, 0x49, 0x46, 0x46, 26, 0, 0, 0, 0x57, 0x45, 0x42, 0x50, 0x56, 0x50, 0x38, 0x4c);
    expect(sniffImageType(webp)).toBe('image/webp');
    // a RIFF file of another form (WAVE audio, same RFC family) is not an image
    expect(sniffImageType(bytes(0x52, 0x49, 0x46, 0x46, 26, 0, 0, 0, 0x57, 0x41, 0x56, 0x45))).toBeNull();
  });

  it('refuses text, an empty file and a PNG signature cut short', () => {
    expect(sniffImageType(new TextEncoder().encode('GIF89a not allowed either'))).toBeNull();
    expect(sniffImageType(new Uint8Array())).toBeNull();
    expect(sniffImageType(bytes(0x89, 0x50, 0x4e, 0x47))).toBeNull();
  });
});
