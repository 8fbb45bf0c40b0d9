import { afterAll, describe, expect, it, vi } from 'vitest';
import { eq } from 'drizzle-orm';
import { db, pool } from '@/db';
import { photos, users } from '@/db/schema';

// Storage unreachable (nothing listens on the discard port): the photo route answers 503 with a
// Retry-After (RFC 9110 §15.6.4 and §10.2.3), not a 500, and says the picture cannot be reached now.
vi.hoisted(() => {
  process.env.S3_ENDPOINT = 'http://127.0.0.1:9';
});
const signedIn = vi.hoisted(() => ({ user: null as unknown }));
vi.mock('@/lib/server/auth', () => ({ currentUser: async () => signedIn.user }));
const { GET } = await import('@/app/api/photos/[id]/route');

afterAll(async () => {
  await pool.end();
});

describe('GET /api/photos/{id} with storage down', () => {
  it('is a 503 with Retry-After, and a photo that does not exist is still a 404', async () => {
    const [admin] = await db.select().from(users).where(eq(users.role, 'admin')).limit(1);
    signedIn.user = { id: admin.id, role: 'admin', carrierId: null, terminalId: admin.homeTerminalId };
    const [photo] = await db
      .select({ id: photos.id })
      .from(photos)
      .where(eq(photos.status, 'stored'))
      .limit(1);
    expect(photo, 'the seed stores demo photos').toBeDefined();

    vi.spyOn(console, 'error').mockImplementation(() => undefined);
    const res = await GET(new Request(`http://localhost/api/photos/${photo.id}`), {
      params: Promise.resolve({ id: photo.id }),
    });
    expect(res.status).toBe(503);
    expect(Number(res.headers.get('retry-after'))).toBeGreaterThan(0);
    expect((await res.json()).code).toBe('unavailable');

    const missing = await GET(new Request('http://localhost/api/photos/x'), {
      params: Promise.resolve({ id: '00000000-0000-4000-8000-000000000000' }),
    });
    expect(missing.status).toBe(404);
  });
});
