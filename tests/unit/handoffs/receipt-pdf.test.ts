import { inflateSync } from 'node:zlib';
import { PDFDocument } from 'pdf-lib';
import { describe, expect, it } from 'vitest';
import { receiptLetters, receiptText, type ReceiptView } from '@/lib/handoffs/receipt';
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

/** The page content streams of a PDF, inflated (pdf-lib writes them with FlateDecode). */
function contentOf(bytes: Uint8Array): string {
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
  return raw;
}

describe('receipt PDF', () => {
  it('prints the time in the terminal’s zone, the code, and a QR link to /verify with the code', async () => {
    const bytes = await buildReceiptPdf(view, 'https://hitchmark.example/verify');
    const doc = await PDFDocument.load(bytes);
    expect(doc.getPageCount()).toBe(1);
    expect(doc.getTitle()).toBe('Hitchmark receipt 7KQ2-M9XD');
    const raw = contentOf(bytes);
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

describe('receipt PDF in Spanish', () => {
  // a coded hold on a tandem pin, restricted to the yard: every line of it has Spanish words
  const spanish: ReceiptView = {
    ...view,
    findings: [
      {
        kind: 'pin_not_engaged',
        itemKey: 'undercarriage.tandem_pin.left_front',
        reason: 'Tandem pin, left front: not engaged.',
        reasonCode: 'hold.pin_not_engaged',
        reasonParams: { item: 'undercarriage.tandem_pin.left_front', label: 'Tandem pin, left front' },
      },
    ],
    holds: [{ severity: 'restricted', restriction: 'yard_only', reason: 'Yard moves only.' }],
  };

  it('writes the receipt, its coded reasons and its date in Spanish, times in the terminal zone', async () => {
    const bytes = await buildReceiptPdf(spanish, 'https://hitchmark.example/verify', 'es');
    const doc = await PDFDocument.load(bytes);
    expect(doc.getTitle()).toBe('Comprobante de Hitchmark 7KQ2-M9XD');
    const raw = contentOf(bytes);
    // Intl (CLDR) abbreviates November as "nov" in Spanish; 15:00 UTC is 09:00 CST (IANA tz data)
    expect(raw).toContain(hex('Entrega (entrada por la caseta) en Bramblecrest Terminal, 2 nov 2026 09:00'));
    expect(raw).toContain(hex('Código de verificación: 7KQ2-M9XD'));
    expect(raw).toContain(hex('- Perno de seguro sin enganchar: Perno del tándem, izquierdo delantero: no'));
    expect(raw).toContain(hex('- Restringida: solo movimientos en el patio. Yard moves only.'));
    expect(raw).not.toContain(hex('Verification code'));
    // the English letter of the same receipt keeps its English words
    expect(receiptText(spanish, 'x', 'en')).toContain('- Locking pin not engaged: ');
  });
});

describe('receipt letters', () => {
  const carrier = { email: 'claims@example.test', locale: 'en' };
  it('the driver when the account has an address, the carrier contact in copy', () => {
    expect(receiptLetters({ email: 'lev@example.test', locale: 'en' }, carrier)).toEqual([
      { to: 'lev@example.test', cc: 'claims@example.test', locale: 'en' },
    ]);
  });
  it('the carrier contact alone when the driver has none, and no copy to the same address', () => {
    expect(receiptLetters(null, carrier)).toEqual([{ to: 'claims@example.test', cc: null, locale: 'en' }]);
    expect(receiptLetters({ email: 'Claims@example.test', locale: 'es' }, carrier)).toEqual([
      { to: 'Claims@example.test', cc: null, locale: 'es' },
    ]);
  });
  it('a driver and a carrier who read different languages each get a letter in their own', () => {
    expect(receiptLetters({ email: 'lev@example.test', locale: 'es' }, carrier)).toEqual([
      { to: 'lev@example.test', cc: null, locale: 'es' },
      { to: 'claims@example.test', cc: null, locale: 'en' },
    ]);
    // a language Hitchmark does not speak is written in English
    expect(receiptLetters(null, { ...carrier, locale: 'fr' })[0].locale).toBe('en');
  });
});
