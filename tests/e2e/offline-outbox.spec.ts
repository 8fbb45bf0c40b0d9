import { expect, test, type Page } from '@playwright/test';
import { and, eq, gte } from 'drizzle-orm';
import { db } from '../../db';
import { handoffs } from '../../db/schema';
import { HandoffFormPage } from './pages/handoff-form-page';
import { SignInPage } from './pages/sign-in-page';
import { reeferOnTheRoad } from './support/road-trailer';

// The phone without signal: the service worker serves the handoff form on a reload offline, the
// draft comes back from IndexedDB, the submit waits in the phone's outbox and is sent exactly once
// when the signal returns. Sign-out then clears what this user left on the phone.

async function controlledByWorker(page: Page) {
  const scope = await page.evaluate(async () => (await navigator.serviceWorker.ready).scope);
  expect(scope).toMatch(/\/$/);
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null);
}

/** Keys in the phone's drafts database (IndexedDB `hitchmark-drafts`). */
function draftKeys(page: Page): Promise<string[]> {
  return page.evaluate(
    () =>
      new Promise<string[]>((resolve, reject) => {
        const open = indexedDB.open('hitchmark-drafts');
        open.onupgradeneeded = () => open.result.createObjectStore('drafts');
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const req = open.result.transaction('drafts').objectStore('drafts').getAllKeys();
          req.onsuccess = () => {
            open.result.close();
            resolve(req.result.map(String));
          };
          req.onerror = () => reject(req.error);
        };
      }),
  );
}

async function fillDrop(form: HandoffFormPage, page: Page, tractor: string) {
  await form.openStep('Who and what');
  await page.getByLabel('Seal number').fill('SL-40417');
  await form.fillHeader({ tractor, loaded: true });
  await form.fillReefer({ fuel: 'Full 8/8', setpoint: '34', returnAir: '35', engineHours: '9650' });
  await form.sameAsLastEverywhere();
  await form.answerSafety(11);
}

test('no signal: the handoff form reloads offline with its draft, the drop waits in the outbox and is sent once', async ({
  page,
  context,
}) => {
  const startedAt = new Date(Date.now() - 1_000);
  await new SignInPage(page).signIn('driver');
  await expect(page).toHaveURL(/\/gate$/);
  await controlledByWorker(page);
  test.setTimeout(180_000);
  const { id: trailerId } = await reeferOnTheRoad();
  await page.goto(`/gate/trailers/${trailerId}`);
  // one online load through the worker keeps the page and its scripts
  await page.reload();
  const form = new HandoffFormPage(page);
  await fillDrop(form, page, 'T-7702');

  await context.setOffline(true);
  await page.reload();
  await form.openStep('Who and what');
  await expect(page.getByLabel('Tractor number')).toHaveValue('T-7702');
  await expect(page.getByLabel('Seal number')).toHaveValue('SL-40417');
  await expect(page.getByTestId('outbox-line')).toContainText('No signal');
  await form.submit('drop');
  await expect(page.getByText('No connection: the handoff is saved on this phone')).toBeVisible();
  await expect(page.getByTestId('outbox-line')).toContainText('1 waiting to send');

  // still offline, another reload: the submit is still waiting, not lost and not doubled
  await page.reload();
  await expect(page.getByTestId('outbox-line')).toContainText('1 waiting to send');
  const rows = () =>
    db
      .select({ id: handoffs.id, key: handoffs.idempotencyKey })
      .from(handoffs)
      .where(and(eq(handoffs.trailerId, trailerId), gte(handoffs.createdAt, startedAt)));
  expect(await rows()).toHaveLength(0);

  await context.setOffline(false);
  await expect(page).toHaveURL(/\/gate\/receipts\/[0-9a-f-]{36}$/, { timeout: 30_000 });
  await expect(page.getByTestId('verification-code')).toBeVisible();
  await expect(page.getByTestId('outbox-line')).not.toContainText('waiting to send');
  const sent = await rows();
  expect(sent).toHaveLength(1);
  expect(page.url()).toContain(sent[0].id);
  // a later reload and a second run of the outbox send nothing again
  await page.reload();
  await page.evaluate(() => window.dispatchEvent(new Event('online')));
  await page.waitForTimeout(1_000);
  expect(await rows()).toHaveLength(1);
});

test('sign-out asks before leaving unsent records, and clears the pages and drafts of this user', async ({
  page,
  context,
}) => {
  const startedAt = new Date(Date.now() - 1_000);
  await new SignInPage(page).signIn('driver');
  await expect(page).toHaveURL(/\/gate$/);
  await controlledByWorker(page);
  test.setTimeout(180_000);
  const { id: trailerId } = await reeferOnTheRoad();
  await page.goto(`/gate/trailers/${trailerId}`);
  await page.reload();
  const form = new HandoffFormPage(page);
  await fillDrop(form, page, 'T-7703');
  await expect.poll(() => draftKeys(page)).toContainEqual(expect.stringContaining(trailerId));

  await context.setOffline(true);
  await form.submit('drop');
  await expect(page.getByTestId('outbox-line')).toContainText('1 waiting to send');
  await page.getByRole('button', { name: 'Sign out' }).click();
  const ask = page.getByRole('alertdialog');
  await expect(ask).toContainText('1 record has not left this phone yet');
  await expect(ask.getByRole('button', { name: 'Sign out and keep them on this phone' })).toBeVisible();

  // "Send now" without signal: tried, still waiting, nothing lost
  await ask.getByRole('button', { name: 'Send now' }).click();
  await expect(ask).toContainText('1 record has not left this phone yet');
  // the signal returns: the outbox sends it and the dialog says so
  await context.setOffline(false);
  await expect(ask.getByRole('button', { name: 'All sent' })).toBeVisible({ timeout: 30_000 });
  const sent = await db
    .select({ id: handoffs.id })
    .from(handoffs)
    .where(and(eq(handoffs.trailerId, trailerId), gte(handoffs.createdAt, startedAt)));
  expect(sent).toHaveLength(1);
  const pagesBefore = await page.evaluate(async () =>
    (await (await caches.open('pages')).keys()).map((r) => new URL(r.url).pathname),
  );
  expect(pagesBefore).toContain(`/gate/trailers/${trailerId}`);
  await ask.getByRole('button', { name: 'Sign out', exact: true }).click();
  await expect(page).toHaveURL(/\/login/);

  // what the worker keeps afterwards: the precache, and at most the sign-in page opened since (a
  // receipt still loading when sign-out cleared the caches is cleared again by the sign-in page)
  const kept = () =>
    page.evaluate(async () => {
      const names = await caches.keys();
      const urls: string[] = [];
      for (const name of names) {
        if (name.includes('precache') || name.startsWith('static-')) continue;
        for (const req of await (await caches.open(name)).keys()) urls.push(new URL(req.url).pathname);
      }
      return { names, urls };
    });
  expect((await kept()).names.some((n) => n.includes('precache'))).toBe(true);
  await expect
    .poll(async () => (await kept()).urls.filter((u) => u.startsWith('/gate') || u.startsWith('/api/')))
    .toEqual([]);
  expect((await draftKeys(page)).filter((k) => k.includes(trailerId))).toEqual([]);
});
