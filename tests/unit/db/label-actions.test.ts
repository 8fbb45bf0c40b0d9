import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { db, pool } from '@/db';
import { getCurrentLabel } from '@/db/queries/labels';
import { trailers, users } from '@/db/schema';
import { seed } from '@/db/seed';
import { IDLE } from '@/lib/result';

// The re-issue server action as a browser would call it, without a running Next server: only the
// session cookie is replaced; the role check, zod, the service and the database are real.
// next.config.mjs turns on authInterrupts, which is how Next lets forbidden() run; the test does the same.
process.env.__NEXT_EXPERIMENTAL_AUTH_INTERRUPTS = 'true';
// version 1: the seeded accounts have never ended their sessions (users.session_version starts at 1)
const session = vi.hoisted(() => ({ userId: undefined as string | undefined, version: 1 }));
vi.mock('@/lib/server/session', () => ({ getSession: async () => session }));
vi.mock('next/cache', () => ({ revalidatePath: () => undefined }));
const { reissueLabelAction } = await import('@/app/(app)/trailers/labels/actions');

// The digests Next gives forbidden() and redirect() (next/dist/client/components/*), which its
// server turns into a 403 page and a redirect.
const FORBIDDEN = { digest: 'NEXT_HTTP_ERROR_FALLBACK;403' };
const redirectTo = (path: string) => ({
  digest: expect.stringMatching(new RegExp(`^NEXT_REDIRECT;\\w+;${path.replace(/[?]/g, '\\$&')};307;$`)),
});

function form(fields: Record<string, string>) {
  const data = new FormData();
  for (const [k, v] of Object.entries(fields)) data.set(k, v);
  return data;
}

/** A demo account by e-mail (staff) or driver number. */
async function signInAs(who: string) {
  const column = who.includes('@') ? users.email : users.driverNumber;
  const [u] = await db.select({ id: users.id }).from(users).where(eq(column, who));
  session.userId = u.id;
}

describe('re-issue label action: roles, input and outcome', () => {
  let trailerId: string;
  beforeAll(async () => {
    await seed();
    const [t] = await db.select({ id: trailers.id }).from(trailers).where(eq(trailers.unitNumber, 'R53050'));
    trailerId = t.id;
  });
  afterAll(async () => {
    await pool.end();
  });

  it('sends a signed-out caller to sign-in and re-issues nothing', async () => {
    session.userId = undefined;
    const before = await getCurrentLabel(trailerId);
    await expect(reissueLabelAction(IDLE, form({ trailerId }))).rejects.toMatchObject(redirectTo('/login'));
    expect((await getCurrentLabel(trailerId))?.id).toBe(before?.id);
  });

  it.each([['jockey@bramblecrest.example'], ['D1001']])(
    'refuses %s (not a clerk or admin) with 403 and re-issues nothing',
    async (who) => {
      await signInAs(who);
      const before = await getCurrentLabel(trailerId);
      await expect(reissueLabelAction(IDLE, form({ trailerId }))).rejects.toMatchObject(FORBIDDEN);
      expect((await getCurrentLabel(trailerId))?.id).toBe(before?.id);
    },
  );

  it('answers a clerk’s unreadable or unknown trailer on the form, not with an error page', async () => {
    await signInAs('clerk@bramblecrest.example');
    const unreadable = await reissueLabelAction(IDLE, form({ trailerId: 'R53050' }));
    expect(unreadable).toMatchObject({
      ok: false,
      formError: 'That trailer could not be read. Reload the page and try again.',
      fieldErrors: { trailerId: ['That is not a trailer or row id.'] },
    });
    const unknown = await reissueLabelAction(
      IDLE,
      form({ trailerId: '00000000-0000-4000-8000-000000000000' }),
    );
    expect(unknown).toMatchObject({ ok: false, formError: expect.stringMatching(/not known/) });
  });

  it('lets an admin re-issue: a new current label, then back to the label page', async () => {
    await signInAs('admin@bramblecrest.example');
    const before = await getCurrentLabel(trailerId);
    await expect(reissueLabelAction(IDLE, form({ trailerId }))).rejects.toMatchObject(
      redirectTo(`/trailers/${trailerId}/label?reissued=1`),
    );
    const after = await getCurrentLabel(trailerId);
    expect(after?.id).toBeDefined();
    expect(after?.id).not.toBe(before?.id);
  });
});
