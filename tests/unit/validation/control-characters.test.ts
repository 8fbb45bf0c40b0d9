import { describe, expect, it } from 'vitest';
import { safeNext, signInSchema } from '@/lib/validation/auth';
import { linkDisputeSchema } from '@/lib/validation/desk';
import { handoffSubmitSchema } from '@/lib/validation/handoffs';
import { noteText, plainText } from '@/lib/validation/text';
import { moveSchema, walkScanSchema } from '@/lib/validation/yard';

// The C0 control characters and DEL (U+0000–U+001F, U+007F) are defined in ISO/IEC 6429 and
// listed as category Cc in the Unicode Character Database. PostgreSQL refuses U+0000 in text
// (SQLSTATE 22021, "invalid byte sequence"), so they must be refused as input, before the insert.
const NUL = '\u0000';
const BELL = '\u0007';
const ESC = '\u001b';
const DEL = '\u007f';

function fieldMessages(
  schema: { safeParse: (v: unknown) => { success: boolean; error?: unknown } },
  v: unknown,
) {
  const r = schema.safeParse(v) as {
    success: boolean;
    error?: { issues: { path: PropertyKey[]; message: string }[] };
  };
  if (r.success) return null;
  return Object.fromEntries(r.error!.issues.map((i) => [i.path.join('.'), i.message]));
}

describe('plainText and noteText refuse control characters', () => {
  const line = plainText(80);
  const note = noteText(400);

  it.each([NUL, BELL, ESC, DEL, '\n', '\r', '\t'])('a single line refuses U+%s', (c) => {
    const r = line.safeParse(`ab${c}cd`);
    expect(r.success).toBe(false);
    expect(r.error?.issues[0].message).toBe('Remove the special characters from this field.');
  });

  it.each([NUL, BELL, ESC, DEL, '\u000b', '\u000c'])('a note refuses U+%s', (c) => {
    const r = note.safeParse(`scuff${c}mark`);
    expect(r.success).toBe(false);
    expect(r.error?.issues[0].message).toBe('Remove the special characters from this note.');
  });

  it('a note keeps line breaks and tabs; both keep letters of any script', () => {
    expect(note.parse('left door:\n\tscuff 4 in.\r\nok')).toBe('left door:\n\tscuff 4 in.\r\nok');
    expect(line.parse('  Zoë Ñandú 北 ')).toBe('Zoë Ñandú 北');
  });
});

describe('each free-text field names itself when it holds one', () => {
  it('driverName and note of a handoff', () => {
    const msgs = fieldMessages(handoffSubmitSchema, { driverName: `Dana${NUL}`, note: `gate${BELL}` });
    expect(msgs?.driverName).toBe('Remove the special characters from this field.');
    expect(msgs?.note).toBe('Remove the special characters from this note.');
  });

  it('unit and target of a yard move', () => {
    expect(fieldMessages(moveSchema, { unit: `R5${NUL}01`, target: 'A-01' })).toEqual({
      unit: 'Remove the special characters from this field.',
    });
    expect(fieldMessages(moveSchema, { unit: 'R501', target: `A${ESC}` })).toEqual({
      target: 'Remove the special characters from this field.',
    });
  });

  it('the scanned text of a walk, the token of a case link', () => {
    expect(fieldMessages(walkScanSchema, { scannedText: `R5${NUL}` })?.scannedText).toBe(
      'Remove the special characters from this field.',
    );
    expect(
      fieldMessages(linkDisputeSchema, { token: `x${NUL}xxxxxxxxxxxx`, note: 'long enough note' }),
    ).toEqual({
      token: 'Remove the special characters from this field.',
    });
  });

  it('a password with a NUL, and a next page with one, are refused or ignored', () => {
    const staff = { method: 'staff', email: 'clerk@hitchmark.example', password: `pw${NUL}` };
    expect(fieldMessages(signInSchema, staff)).toEqual({
      password: 'Remove the special characters from this field.',
    });
    expect(safeNext(`/desk${NUL}`)).toBeNull();
    expect(safeNext('/desk\r\nSet-Cookie: x=1')).toBeNull();
    expect(safeNext('/desk?state=open')).toBe('/desk?state=open');
  });
});
