import AxeBuilder from '@axe-core/playwright';
import { expect, test, type BrowserContext, type Page } from '@playwright/test';
import { desc, eq } from 'drizzle-orm';
import { db } from '../../db';
import { handoffs, users } from '../../db/schema';
import { baseURL } from '../../playwright.config';
import { ACCOUNTS, SignInPage, type AccountName } from './pages/sign-in-page';
import { YardWalkPage } from './pages/yard-walk-page';
import { walkRowFixture } from './support/yard-state';

// Issue 13 item 5: axe-core (@axe-core/playwright) on the main pages of each role, in the day and
// the night theme. Any serious or critical violation of the WCAG 2.x A/AA rules fails the page.
// The database pool is shared with the specs after this one in the worker, so it is not ended here.

const THEMES = ['light', 'dark'] as const;

async function setTheme(context: BrowserContext, theme: (typeof THEMES)[number]) {
  await context.addCookies([{ name: 'hm-theme', value: theme, url: baseURL }]);
}

async function seriousViolations(page: Page): Promise<string[]> {
  const { violations } = await new AxeBuilder({ page })
    .withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'])
    .analyze();
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}

/** Buttons, links and form controls people press in the page body: at least 48 px high (gloved hands; common practice). */
async function smallTargets(page: Page): Promise<string[]> {
  return page
    .locator(
      'main button, main a, main select, main input:not([type=hidden]):not([type=checkbox]):not([type=radio]), main summary',
    )
    .evaluateAll((els) =>
      els
        .filter((el) => (el as HTMLElement).offsetParent !== null && !el.closest('p, td, li > p, svg'))
        .map((el) => ({
          what: `${el.tagName} ${el.textContent?.trim().slice(0, 30)}`,
          h: el.getBoundingClientRect().height,
        }))
        .filter((b) => b.h < 47.5)
        .map((b) => `${b.what} (${Math.round(b.h)} px)`),
    );
}

async function check(page: Page, path: string, theme: string) {
  await page.goto(path);
  await expect(page.locator('html')).toHaveAttribute('data-theme', theme === 'light' ? 'light' : 'dark');
  await expect(page.locator('main')).toBeVisible();
  expect(await seriousViolations(page), `${path} (${theme})`).toEqual([]);
  expect(await smallTargets(page), `small targets on ${path} (${theme})`).toEqual([]);
}

async function driverPages(): Promise<string[]> {
  const [last] = await db
    .select({ id: handoffs.id, trailerId: handoffs.trailerId })
    .from(handoffs)
    .innerJoin(users, eq(users.id, handoffs.driverId))
    .where(eq(users.driverNumber, 'D1001'))
    .orderBy(desc(handoffs.occurredAt))
    .limit(1);
  return ['/gate', `/gate/trailers/${last.trailerId}`, `/gate/receipts/${last.id}`];
}

async function jockeyPages(page: Page): Promise<string[]> {
  const { rowName } = await walkRowFixture();
  await new YardWalkPage(page).start(rowName);
  return ['/yard', new URL(page.url()).pathname, '/yard/moves'];
}

async function clerkPages(page: Page): Promise<string[]> {
  await page.goto('/desk');
  const firstCase = await page
    .getByRole('list', { name: 'Cases' })
    .getByRole('link')
    .first()
    .getAttribute('href');
  return ['/desk', firstCase!, '/desk/reports'];
}

const ROLES: { who: AccountName; pages: (page: Page) => Promise<string[]> }[] = [
  { who: 'driver', pages: driverPages },
  { who: 'jockey', pages: jockeyPages },
  { who: 'clerk', pages: clerkPages },
  { who: 'admin', pages: async () => ['/admin', '/admin/yard', '/admin/rates'] },
];

for (const { who, pages } of ROLES) {
  test(`${who}: main pages have no serious accessibility violation, day and night`, async ({
    page,
    context,
  }) => {
    // several pages in two themes on a shared 2-core machine
    test.setTimeout(300_000);
    await new SignInPage(page).signIn(who);
    await expect(page).toHaveURL(new RegExp(`${ACCOUNTS[who].home}$`));
    const paths = await pages(page);
    for (const theme of THEMES) {
      await setTheme(context, theme);
      for (const path of paths) await check(page, path, theme);
    }
  });
}

test('public verify page: no serious accessibility violation, day and night', async ({ page, context }) => {
  for (const theme of THEMES) {
    await setTheme(context, theme);
    await check(page, '/verify', theme);
  }
});

// README pictures (HM_SCREENSHOTS=1): the yard board, a desk case and a trailer file, by day and by
// night, on a phone and on a desktop-sized window. Seeded demo data only.
test('README screenshots of the yard board, a case and a trailer file, day and night', async ({
  page,
  context,
}) => {
  test.skip(process.env.HM_SCREENSHOTS !== '1', 'only when HM_SCREENSHOTS=1');
  await new SignInPage(page).signIn('clerk');
  await expect(page).toHaveURL(/\/desk$/);
  await page.goto('/desk');
  const firstCase = await page
    .getByRole('list', { name: 'Cases' })
    .getByRole('link')
    .first()
    .getAttribute('href');
  await page.goto(firstCase!);
  const trailerFile = await page.getByRole('link', { name: 'Trailer file' }).getAttribute('href');
  const shots = [
    { name: 'yard-board', path: '/yard' },
    { name: 'desk-case', path: firstCase! },
    { name: 'trailer-file', path: trailerFile! },
  ];
  const phone = page.viewportSize()!;
  for (const theme of THEMES)
    for (const size of ['phone', 'desktop'] as const) {
      await setTheme(context, theme);
      await page.setViewportSize(size === 'phone' ? phone : { width: 1280, height: 900 });
      for (const { name, path } of shots) {
        await page.goto(path);
        await expect(page.locator('html')).toHaveAttribute('data-theme', theme);
        await page.screenshot({
          path: `docs/screenshots/${name}-${theme === 'light' ? 'day' : 'night'}-${size}.png`,
        });
      }
    }
});
