import { expect, test, type Page } from '@playwright/test';
import { and, eq, gte } from 'drizzle-orm';
import { PNG } from 'pngjs';
import { db } from '../../db';
import { handoffs, photos } from '../../db/schema';
import { HandoffFormPage } from './pages/handoff-form-page';
import { SignInPage } from './pages/sign-in-page';
import { reeferOnTheRoad } from './support/road-trailer';

// A photo taken without signal: shrunk on the phone and kept, with its bytes, in the phone's
// outbox (IndexedDB); the handoff that needs it queues after it. When the signal returns the photo
// goes first (announce → PUT → complete), then the handoff: one photo stored, one handoff, and
// the photo is the one the handoff holds.

async function controlledByWorker(page: Page) {
  await page.evaluate(async () => (await navigator.serviceWorker.ready).scope);
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null);
}

function smallPng(): Buffer {
  const png = new PNG({ width: 64, height: 48 });
  for (let i = 0; i < png.data.length; i += 4) png.data.set([(i / 3) % 256, 90, 160, 255], i);
  return PNG.sync.write(png);
}

/** A drop of a road trailer with new skin damage, its note written: only the photo is missing. */
async function damagedDrop(page: Page, trailerId: string) {
  await page.goto(`/gate/trailers/${trailerId}`);
  // one online load through the worker keeps the page and its scripts
  await page.reload();
  const form = new HandoffFormPage(page);
  await form.fillHeader({ tractor: 'T-7811', loaded: true });
  await form.openStep('Who and what');
  await page.getByLabel('Seal number').fill('SL-52290');
  await form.fillReefer({ fuel: 'Full 8/8', setpoint: '34', returnAir: '35', engineHours: '9720' });
  await form.sameAsLastEverywhere();
  await form.answerSafety(11);
  await form.openStep('The rest of the box');
  await form.showItems('Left side');
  const skin = form.item('Left side skin');
  await form.choose('Left side skin: condition', 'Damaged', skin);
  await form.choose('Insulation showing?', 'Yes, showing', skin);
  await skin.getByLabel('Note: what do you see?').fill('Skin dented below the rear marker light.');
  return { form, skin };
}

/** The photo and handoff rows of this trailer written since `since`. */
function rowsOf(trailerId: string, since: Date) {
  return {
    photoRows: () =>
      db
        .select({ id: photos.id, status: photos.status, handoffId: photos.handoffId })
        .from(photos)
        .where(and(eq(photos.trailerId, trailerId), gte(photos.createdAt, since))),
    handoffRows: () =>
      db
        .select({ id: handoffs.id })
        .from(handoffs)
        .where(and(eq(handoffs.trailerId, trailerId), gte(handoffs.createdAt, since))),
  };
}

test('no signal: a damage photo waits on the phone with its bytes and is stored once, before the handoff that holds it', async ({
  page,
  context,
}) => {
  test.setTimeout(180_000);
  const startedAt = new Date(Date.now() - 1_000);
  await new SignInPage(page).signIn('driver');
  await expect(page).toHaveURL(/\/gate$/);
  await controlledByWorker(page);
  const { id: trailerId } = await reeferOnTheRoad();
  const { form, skin } = await damagedDrop(page, trailerId);

  await context.setOffline(true);
  await skin
    .getByLabel('Photo of Left side skin')
    .setInputFiles({ name: 'skin.png', mimeType: 'image/png', buffer: smallPng() });
  const tile = skin.getByRole('img', { name: 'Photo of Left side skin' });
  await expect(tile).toHaveText('Waiting to send', { timeout: 20_000 });
  await expect(page.getByTestId('outbox-line')).toContainText('1 waiting to send');

  await form.submit('drop');
  await expect(page.getByText('No connection: the handoff is saved on this phone')).toBeVisible();
  await expect(page.getByTestId('outbox-line')).toContainText('2 waiting to send');
  const { photoRows, handoffRows } = rowsOf(trailerId, startedAt);
  expect(await photoRows()).toHaveLength(0);
  expect(await handoffRows()).toHaveLength(0);

  await context.setOffline(false);
  // the handoff is accepted only with its photo stored first (the server refuses a missing one)
  await expect(page).toHaveURL(/\/gate\/receipts\/[0-9a-f-]{36}$/, { timeout: 30_000 });
  await expect(page.getByTestId('outbox-line')).not.toContainText('waiting to send');
  const sent = await handoffRows();
  expect(sent).toHaveLength(1);
  const stored = await photoRows();
  expect(stored).toEqual([{ id: expect.any(String), status: 'stored', handoffId: sent[0].id }]);
  const thumb = page.getByRole('region', { name: /Photos/ }).getByRole('img');
  await expect(thumb).toHaveCount(1);
  await expect.poll(() => thumb.evaluate((img: HTMLImageElement) => img.naturalWidth)).toBeGreaterThan(0);

  // the outbox run again (reload, another 'online' event): nothing stored or recorded twice
  await page.reload();
  await page.evaluate(() => window.dispatchEvent(new Event('online')));
  await page.waitForTimeout(1_000);
  expect(await photoRows()).toHaveLength(1);
  expect(await handoffRows()).toHaveLength(1);
});

test('signal back, photo still waiting: the handoff is queued behind its photo ("2 waiting to send"), not refused', async ({
  page,
  context,
}) => {
  test.setTimeout(180_000);
  const startedAt = new Date(Date.now() - 1_000);
  await new SignInPage(page).signIn('driver');
  await expect(page).toHaveURL(/\/gate$/);
  await controlledByWorker(page);
  const { id: trailerId } = await reeferOnTheRoad();
  const { form, skin } = await damagedDrop(page, trailerId);
  const { photoRows, handoffRows } = rowsOf(trailerId, startedAt);

  await context.setOffline(true);
  await skin
    .getByLabel('Photo of Left side skin')
    .setInputFiles({ name: 'skin.png', mimeType: 'image/png', buffer: smallPng() });
  await expect(skin.getByRole('img', { name: 'Photo of Left side skin' })).toHaveText('Waiting to send', {
    timeout: 20_000,
  });
  // the signal returns, but the photo cannot get through yet (the upload service is busy): it waits
  await page.route('**/api/uploads', (route) =>
    route.fulfill({ status: 503, json: { code: 'unavailable', message: 'Try again shortly.' } }),
  );
  await context.setOffline(false);
  await expect(page.getByTestId('outbox-line')).toHaveText('1 waiting to send');

  await form.submit('drop');
  await expect(
    page
      .getByRole('status')
      .filter({ hasText: 'is sent right after its photo, which is still waiting to send' }),
  ).toBeVisible();
  await expect(page.getByTestId('outbox-line')).toHaveText('2 waiting to send');
  // not refused for a missing photo, and nothing recorded before the photo
  await expect(page.getByText('A photo is missing')).toHaveCount(0);
  expect(await handoffRows()).toHaveLength(0);

  // the upload service answers again: the photo goes first, then the handoff that holds it
  await page.unroute('**/api/uploads');
  await page.evaluate(() => window.dispatchEvent(new Event('online')));
  await expect(page).toHaveURL(/\/gate\/receipts\/[0-9a-f-]{36}$/, { timeout: 30_000 });
  const sent = await handoffRows();
  expect(sent).toHaveLength(1);
  expect(await photoRows()).toEqual([{ id: expect.any(String), status: 'stored', handoffId: sent[0].id }]);
});
