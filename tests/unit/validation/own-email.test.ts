import { describe, expect, it } from 'vitest';
import { knownRefusal } from '@/lib/i18n/refusals';
import { EMAIL_MAX, ownEmailSchema } from '@/lib/validation/account';

const issue = (email: string) => {
  const r = ownEmailSchema.safeParse({ email });
  return r.success ? null : r.error.issues.map((i) => i.message);
};

describe("a driver's own e-mail address", () => {
  it('keeps a whole address in lower case, and an empty field removes it', () => {
    expect(ownEmailSchema.parse({ email: '  Lev.Marchetti@Example.test ' })).toEqual({
      email: 'lev.marchetti@example.test',
    });
    expect(ownEmailSchema.parse({ email: '' })).toEqual({ email: null });
  });

  it('refuses an address longer than RFC 5321 allows (254), with a message the catalogue knows', () => {
    // RFC 5321 §4.5.3.1.3: a path is at most 256 octets, brackets included, so an address 254
    const local = 'a'.repeat(64); // §4.5.3.1.1: a local part is at most 64 octets
    const domain = (n: number) => `${'b'.repeat(n - 4)}.com`;
    const at254 = `${local}@${['c'.repeat(60), 'd'.repeat(60), domain(67)].join('.')}`;
    expect(at254).toHaveLength(EMAIL_MAX);
    expect(issue(at254)).toBeNull();
    const messages = issue(`x${at254}`);
    expect(messages).toEqual(['An e-mail address is at most 254 characters.']);
    expect(knownRefusal(messages![0])).toEqual({ key: 'emailTooLong', values: { max: '254' } });
  });

  it('refuses something that is not an address, and a wrong type', () => {
    const messages = issue('lev@yard');
    expect(messages).toEqual(['Type the whole address, like name@example.com, or leave it empty.']);
    expect(knownRefusal(messages![0])?.key).toBe('emailInvalid');
    expect(ownEmailSchema.safeParse({ email: 5 }).success).toBe(false);
  });
});
