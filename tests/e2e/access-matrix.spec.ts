import { randomUUID } from 'node:crypto';
import { expect, request as playwrightRequest, test } from '@playwright/test';
import { and, eq, inArray } from 'drizzle-orm';
import { db } from '../../db';
import { cases, handoffs, labels, photos, trailers, users, yardWalks } from '../../db/schema';
import { signCaseLink } from '../../lib/desk/case-link';
import { signLabelToken } from '../../lib/engine/identity/label-token';
import { baseURL } from '../../playwright.config';
import { PAGES, ROUTES, VISITOR_ACCOUNTS, VISITORS, type Ids, type Visitor } from '../support/access-matrix';
import { sessionCookieFor } from '../support/session-cookie';

// Every page and route-handler cell of the access matrix, sent over HTTP to `next start`: the
// status on the wire must be the one in the table (a denied page is 403/404, never a 200 that
// streams a forbidden body). Cookies are sealed the way the app seals them (tests/support/session-cookie.ts),
// so no sign-in form is needed.

async function cookieOf(visitor: Visitor): Promise<string | null> {
  return visitor === 'none' ? null : sessionCookieFor(VISITOR_ACCOUNTS[visitor]);
}

async function recordIds(): Promise<Ids> {
  const [own] = await db.select().from(users).where(eq(users.driverNumber, 'D2001'));
  const ownHandoffs = db
    .select({ id: handoffs.id })
    .from(handoffs)
    .where(eq(handoffs.carrierId, own.carrierId!));
  const [receipt] = await db
    .select({ id: handoffs.id, code: handoffs.verificationCode })
    .from(handoffs)
    .where(eq(handoffs.carrierId, own.carrierId!))
    .limit(1);
  const [c] = await db
    .select({ id: cases.id })
    .from(cases)
    .where(inArray(cases.handoffId, ownHandoffs))
    .limit(1);
  const [photo] = await db
    .select({ id: photos.id })
    .from(photos)
    .where(and(eq(photos.status, 'stored'), inArray(photos.handoffId, ownHandoffs)))
    .limit(1);
  const [trailer] = await db.select({ id: trailers.id }).from(trailers).limit(1);
  // a walk at the jockey's terminal (the seed has none): started with no rows, never scanned
  const [jockey] = await db.select().from(users).where(eq(users.email, 'jockey@bramblecrest.example'));
  const [walk] = await db
    .insert(yardWalks)
    .values({ terminalId: jockey.homeTerminalId!, startedById: jockey.id, rowIds: [] })
    .returning({ id: yardWalks.id });
  const [label] = await db.insert(labels).values({ trailerId: trailer.id }).returning({ id: labels.id });
  for (const [what, v] of Object.entries({ receipt, c, photo, trailer, walk })) {
    if (!v) throw new Error(`the demo seed has no ${what} for the access matrix`);
  }
  return {
    receiptId: receipt.id,
    verificationCode: receipt.code,
    caseId: c.id,
    photoId: photo.id,
    trailerId: trailer.id,
    walkId: walk.id,
    labelToken: signLabelToken({ labelId: label.id, trailerId: trailer.id }, process.env.LABEL_SECRET!),
    caseLinkToken: signCaseLink(
      { caseId: c.id, carrierId: own.carrierId!, expiresAt: new Date(Date.now() + 86_400_000) },
      process.env.CASE_LINK_SECRET ?? process.env.RECEIPT_SECRET!,
    ),
    unknownId: randomUUID(),
  };
}

test('every page and route handler answers each visitor as the access matrix says', async () => {
  test.setTimeout(180_000);
  const ids = await recordIds();
  const wrong: string[] = [];
  let cells = 0;
  for (const visitor of VISITORS) {
    const cookie = await cookieOf(visitor);
    const api = await playwrightRequest.newContext({
      baseURL,
      maxRedirects: 0,
      extraHTTPHeaders: cookie ? { cookie } : {},
    });
    for (const row of PAGES) {
      const res = await api.get(row.url(ids), { maxRedirects: 0 });
      cells++;
      if (res.status() !== row.expect[visitor])
        wrong.push(`${visitor} GET ${row.url(ids)}: ${res.status()}, expected ${row.expect[visitor]}`);
    }
    for (const row of ROUTES) {
      const res =
        row.method === 'GET'
          ? await api.get(row.url(ids), { maxRedirects: 0 })
          : await api.post(row.url(ids), {
              maxRedirects: 0,
              headers: { origin: baseURL, ...(row.body ? { 'content-type': 'application/json' } : {}) },
              data: row.body ? JSON.stringify(row.body) : undefined,
            });
      cells++;
      if (res.status() !== row.expect[visitor])
        wrong.push(
          `${visitor} ${row.method} ${row.url(ids)}: ${res.status()}, expected ${row.expect[visitor]}`,
        );
    }
    await api.dispose();
  }
  console.log(`access matrix: ${cells} page and route cells checked over HTTP, ${wrong.length} wrong`);
  expect(wrong).toEqual([]);
  expect(cells).toBe(VISITORS.length * (PAGES.length + ROUTES.length));
});
