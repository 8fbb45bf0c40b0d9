import { z } from 'zod';

// C0 controls (NUL among them) and DEL: never part of what a person types into a field, and
// PostgreSQL refuses NUL in text. Tab, line feed and carriage return are allowed in notes only.
const CONTROL = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/;
const CONTROL_OR_BREAK = /[\u0000-\u001f\u007f]/;

/** True when `s` holds a control character other than tab, line feed or carriage return. */
export const hasControl = (s: string) => CONTROL.test(s);

/** One line of text: trimmed, at most `max` characters, no control characters. */
export const plainText = (max: number, message = `At most ${max} characters.`) =>
  z
    .string()
    .trim()
    .max(max, { error: message })
    .refine((s) => !CONTROL_OR_BREAK.test(s), { error: 'Remove the special characters from this field.' });

/** Several lines of text (a note): like plainText, but line breaks and tabs are kept. */
export const noteText = (max: number, message = `At most ${max} characters.`) =>
  z
    .string()
    .trim()
    .max(max, { error: message })
    .refine((s) => !CONTROL.test(s), { error: 'Remove the special characters from this note.' });
