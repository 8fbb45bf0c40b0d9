import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';
import { eq } from 'drizzle-orm';
import { db } from '../../db';
import { walkScans } from '../../db/schema';
import { SignInPage } from './pages/sign-in-page';
import { YardWalkPage } from './pages/yard-walk-page';
import { walkRowFixture } from './support/yard-state';

const shots = process.env.HM_SCREENSHOTS === '1';

// The database pool is shared by every spec this worker runs (yard-walk.spec.ts comes after this
// one and still needs it), so it is not ended here.

/** axe-core's WCAG 2.x A/AA rules on the page as drawn; serious and critical findings fail. */
async function expectNoSeriousViolations(page: Page) {
  const { violations } = await new AxeBuilder({ page })
    .withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'])
    .analyze();
  const bad = violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  expect(bad.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`)).toEqual([]);
}

/** Every button and link in the region is at least 48 px high (gloved hands; common practice). */
async function expectTouchTargets(page: Page, selector: string) {
  const small = await page.locator(selector).evaluateAll((els) =>
    els
      .filter((el) => (el as HTMLElement).offsetParent !== null)
      .map((el) => ({ text: el.textContent?.trim(), h: el.getBoundingClientRect().height }))
      .filter((b) => b.h < 47.5),
  );
  expect(small).toEqual([]);
}

test('night and Spanish: chosen on the sign-in page, drawn by the server, no English left on the shell', async ({
  page,
}) => {
  await page.goto('/login');
  await page.getByRole('group', { name: 'Screen' }).getByRole('button', { name: 'Night' }).click();
  await expect(page.locator('html')).toHaveAttribute('data-theme', 'dark');
  await page.getByRole('button', { name: 'Español' }).click();
  await expect(page.locator('html')).toHaveAttribute('lang', 'es');
  await expect(page.getByRole('heading', { name: 'Entrar' })).toBeVisible();
  // the body really is dark: the night paper token, not the day one
  expect(await page.evaluate(() => getComputedStyle(document.body).backgroundColor)).toBe('rgb(11, 15, 20)');
  for (const english of ['Sign in', 'Driver number', 'Terminal staff', 'How to sign in'])
    await expect(page.getByText(english, { exact: true })).toHaveCount(0);
  await expectTouchTargets(page, 'main button, main a');
  await expectNoSeriousViolations(page);
  if (shots) await page.screenshot({ path: 'docs/screenshots/login-dark.png' });

  // the server writes the theme and language into the first byte of HTML: no white flash, no English flash
  const html = await (await page.request.get('/login')).text();
  expect(html).toMatch(/<html[^>]*lang="es"/);
  expect(html).toMatch(/<html[^>]*data-theme="dark"/);

  // sign in (Spanish labels), the shell answers in Spanish
  await page.getByRole('tab', { name: 'Personal de la terminal' }).click();
  await page.getByLabel('Correo').fill('jockey@bramblecrest.example');
  await page.getByLabel('Contraseña').fill('hitchmark-jockey');
  await page.getByRole('button', { name: 'Entrar' }).click();
  await expect(page).toHaveURL(/\/yard$/);
  const nav = page.getByRole('navigation', { name: 'Secciones' });
  await expect(nav.getByRole('link', { name: 'Patio' })).toBeVisible();
  await expect(page.getByRole('button', { name: 'Salir' })).toBeVisible();
  for (const english of ['Sign out', 'Skip to content', 'Sections'])
    await expect(page.getByText(english, { exact: true })).toHaveCount(0);
  await expectTouchTargets(page, 'header button, header a');
  if (shots) await page.screenshot({ path: 'docs/screenshots/yard-board-dark.png' });

  // back to English and day for the next journeys on this phone
  await page.getByRole('button', { name: 'English' }).click();
  await expect(page.getByRole('button', { name: 'Sign out' })).toBeVisible();
  await page.getByRole('button', { name: 'Day' }).click();
  await expect(page.locator('html')).toHaveAttribute('data-theme', 'light');
});

test('no signal: the service worker keeps a yard walk, a reload offline opens it, the scan is sent once', async ({
  page,
  context,
}) => {
  const { rowName, tag, slots } = await walkRowFixture();
  await new SignInPage(page).signIn('jockey');
  await expect(page).toHaveURL(/\/yard$/);
  // installed and in control of this page
  const scope = await page.evaluate(async () => (await navigator.serviceWorker.ready).scope);
  expect(scope).toMatch(/\/$/);
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null);

  const walk = new YardWalkPage(page);
  await walk.start(rowName);
  const walkUrl = page.url();
  const walkId = walkUrl.split('/').pop()!;
  // one online load through the worker keeps the page and its scripts
  await page.reload();
  await expect(page.getByRole('button', { name: 'Record scan' })).toBeVisible();

  await context.setOffline(true);
  await page.reload();
  await expect(page.getByRole('button', { name: 'Record scan' })).toBeVisible();
  await walk.scan(`NOSIG${tag}`, slots[0]);
  await expect(walk.scans().filter({ hasText: 'Waiting to send' })).toHaveCount(1);
  await context.setOffline(false);
  await expect(
    walk
      .scans()
      .filter({ hasText: `NOSIG${tag}` })
      .filter({ hasText: 'Sent' }),
  ).toHaveCount(1);

  // exactly once on the server, even after another reload re-reads the queue
  await page.reload();
  await expect(walk.scans().filter({ hasText: 'Sent' })).toHaveCount(1);
  const rows = await db.select({ id: walkScans.id }).from(walkScans).where(eq(walkScans.walkId, walkId));
  expect(rows).toHaveLength(1);
  await walk.finish();
  await expect(walk.count('unknown')).toHaveText('1');
});
