import { expect, test, type Page } from '@playwright/test';
import { eq } from 'drizzle-orm';
import { db } from '../../db';
import { trailers, yardMoves } from '../../db/schema';
import { YardMovePage } from './pages/yard-move-page';
import { SignInPage } from './pages/sign-in-page';
import { walkRowFixture } from './support/yard-state';

// A jockey's yard move without signal: the move page reloads offline from the service worker, the
// move waits in the phone's outbox under its key ("1 waiting to send"), and is recorded once when
// the signal returns, however often the outbox runs after that, at the time it was made.

async function controlledByWorker(page: Page) {
  await page.evaluate(async () => (await navigator.serviceWorker.ready).scope);
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null);
}

test('no signal: a yard move waits on the phone, counts as waiting, and is recorded once when the signal returns', async ({
  page,
  context,
}) => {
  test.setTimeout(180_000);
  const { units, slots, trailerIds } = await walkRowFixture();
  const moves = () => db.select().from(yardMoves).where(eq(yardMoves.trailerId, trailerIds[0]));
  await new SignInPage(page).signIn('jockey');
  await expect(page).toHaveURL(/\/yard$/);
  await controlledByWorker(page);
  const form = new YardMovePage(page);
  await form.open();
  // one online load through the worker keeps the page and its scripts
  await page.reload();

  await context.setOffline(true);
  await page.reload();
  await expect(page.getByTestId('outbox-line')).toContainText('No signal');
  // checked on the phone before it is queued: an empty target is not kept
  await form.move(units[0], '');
  await expect(form.target()).toHaveAccessibleDescription('Scan or type the target slot or door.');
  const queuedFrom = Date.now();
  await form.move(units[0], slots[3]);
  await expect(
    page.getByRole('status').filter({ hasText: `the move of ${units[0]} to ${slots[3]} is kept` }),
  ).toBeVisible();
  await expect(page.getByTestId('outbox-line')).toContainText('1 waiting to send');
  await expect(page.getByText(`${units[0]} → ${slots[3]}: waiting to send`)).toBeVisible();
  const queuedBy = Date.now();

  // a reload still without signal: the move is still waiting, not lost and not sent
  await page.reload();
  await expect(page.getByTestId('outbox-line')).toContainText('1 waiting to send');
  expect(await moves()).toHaveLength(0);
  // a few seconds without signal, so the move's time and its arrival are told apart
  await page.waitForTimeout(3_000);

  const onlineAt = Date.now();
  await context.setOffline(false);
  await expect(page.getByText(`${units[0]} → ${slots[3]}: sent`)).toBeVisible({ timeout: 30_000 });
  await expect(page.getByTestId('outbox-line')).not.toContainText('waiting to send');
  const recorded = await moves();
  expect(recorded).toHaveLength(1);
  expect(recorded[0].clientKey).toMatch(/^[0-9a-f-]{36}$/);
  // recorded at the time the jockey made it (the phone's clock), and the arrival kept beside it
  expect(recorded[0].movedAt.getTime()).toBeGreaterThanOrEqual(queuedFrom - 1_000);
  expect(recorded[0].movedAt.getTime()).toBeLessThanOrEqual(queuedBy + 1_000);
  expect(recorded[0].createdAt.getTime()).toBeGreaterThanOrEqual(onlineAt - 1_000);
  const [trailer] = await db
    .select({ spot: trailers.currentSpotId })
    .from(trailers)
    .where(eq(trailers.id, trailerIds[0]));
  expect(trailer.spot).toBe(recorded[0].toSpotId);

  // the outbox run again (reload, another 'online' event): nothing is recorded twice
  await page.reload();
  await page.evaluate(() => window.dispatchEvent(new Event('online')));
  await page.waitForTimeout(1_000);
  expect(await moves()).toHaveLength(1);
  await page
    .getByRole('listitem')
    .filter({ hasText: `${units[0]} → ${slots[3]}: sent` })
    .getByRole('button', { name: 'Remove from the list' })
    .click();
  await expect(page.getByText(`${units[0]} → ${slots[3]}: sent`)).toHaveCount(0);
});
