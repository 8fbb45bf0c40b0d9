import { inflateSync } from 'node:zlib';
import { PDFDocument } from 'pdf-lib';
import { describe, expect, it } from 'vitest';
import { receiptRecipients, receiptText, type ReceiptView } from '@/lib/handoffs/receipt';
import { buildReceiptPdf, receiptVerifyLink } from '@/lib/handoffs/receipt-pdf';

// Invented receipt: terminal, carrier and people are demo names.
const view: ReceiptView = {
  handoffId: '3f1c2b7e-8a4d-4c1e-9b2a-6d5e4f3a2b1c',
  unitNumber: 'R53186',
  kind: 'drop',
  // 15:00 UTC on 2 Nov 2026; the US left daylight time on 1 Nov 2026, so Chicago is UTC−6 (IANA tz data)
  occurredAt: new Date('2026-11-02T15:00:00Z'),
  terminalName: 'Bramblecrest Terminal',
  timeZone: 'America/Chicago',
  carrierName: 'Osterlind Freightways',
  driverName: 'Lev Marchetti',
  tractorNumber: 'T-4411',
  isLoaded: false,
  sealNumber: null,
  fuelEighths: 8,
  spotLabel: 'A-07',
  verificationCode: '7KQ2M9XD',
  contentHash: 'ab'.repeat(32),
  findings: [
    { kind: 'new', itemKey: 'left_side.skin', reason: 'Left side skin: found damaged — 30 °F side.' },
  ],
  holds: [],
  photos: [],
};

const hex = (s: string) => Buffer.from(s, 'latin1').toString('hex').toUpperCase();

describe('receipt PDF', () => {
  it('prints the time in the terminal’s zone, the code, and a QR link to /verify with the code', async () => {
    const bytes = await buildReceiptPdf(view, 'https://hitchmark.example/verify');
    const doc = await PDFDocument.load(bytes);
    expect(doc.getPageCount()).toBe(1);
    expect(doc.getTitle()).toBe('Hitchmark receipt 7KQ2-M9XD');
    // the page content streams, inflated (pdf-lib writes them with FlateDecode)
    const file = Buffer.from(bytes);
    let raw = '';
    for (let at = file.indexOf('stream'); at !== -1; at = file.indexOf('stream', at + 6)) {
      const start = file[at + 6] === 0x0d ? at + 8 : at + 7;
      const end = file.indexOf('endstream', start);
      if (end === -1) break;
      try {
        raw += inflateSync(file.subarray(start, end)).toString('latin1');
      } catch {
        // not a compressed stream
      }
      at = end;
    }
    // pdf-lib writes each line as a hex string: look for the lines themselves
    expect(receiptText(view, 'x')).toContain('2 Nov 2026 09:00');
    expect(raw).toContain(hex('Drop (gate in) at Bramblecrest Terminal, 2 Nov 2026 09:00'));
    expect(raw).toContain(hex('Verification code: 7KQ2-M9XD'));
    expect(raw).not.toContain(hex('2 Nov 2026 15:00'));
    expect(receiptVerifyLink('https://hitchmark.example/verify', view.verificationCode)).toBe(
      'https://hitchmark.example/verify?code=7KQ2-M9XD',
    );
  });
});

describe('receipt recipients', () => {
  it('the driver when the account has an address, the carrier contact in copy', () => {
    expect(receiptRecipients('lev@example.test', 'claims@example.test')).toEqual({
      to: 'lev@example.test',
      cc: 'claims@example.test',
    });
  });
  it('the carrier contact alone when the driver has none, and no copy to the same address', () => {
    expect(receiptRecipients(null, 'claims@example.test')).toEqual({ to: 'claims@example.test', cc: null });
    expect(receiptRecipients('Claims@example.test', 'claims@example.test')).toEqual({
      to: 'Claims@example.test',
      cc: null,
    });
  });
});
