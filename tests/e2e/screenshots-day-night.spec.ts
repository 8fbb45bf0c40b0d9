import { expect, test, type Page } from '@playwright/test';
import { eq } from 'drizzle-orm';
import { db } from '../../db';
import { users, yardRows, yardWalks } from '../../db/schema';
import { baseURL } from '../../playwright.config';
import { SignInPage, type AccountName } from './pages/sign-in-page';
import { reeferOnTheRoad } from './support/road-trailer';
import { walkRowFixture } from './support/yard-state';

// README screenshots (HM_SCREENSHOTS=1 only): the gate's handoff form, a yard walk in progress and
// the desk's queue on a phone, each in the day and the night theme, written to
// docs/screenshots/<screen>-day.png and <screen>-night.png.
const shots = process.env.HM_SCREENSHOTS === '1';
const THEMES = [
  { name: 'day', cookie: 'light', scheme: 'light' },
  { name: 'night', cookie: 'dark', scheme: 'dark' },
] as const;

async function signInWithTheme(page: Page, account: AccountName, theme: (typeof THEMES)[number]) {
  await page.context().addCookies([{ name: 'hm-theme', value: theme.cookie, url: baseURL }]);
  await page.emulateMedia({ colorScheme: theme.scheme });
  await new SignInPage(page).signIn(account);
}

async function shoot(page: Page, screen: string, theme: string) {
  // the theme really applied: the page is not shot in the other theme by mistake
  await expect(page.locator('html')).toHaveAttribute('data-theme', theme === 'day' ? 'light' : 'dark');
  await page.evaluate(() => document.fonts.ready);
  await page.screenshot({ path: `docs/screenshots/${screen}-${theme}.png` });
}

test.describe('day and night screenshots', () => {
  test.skip(!shots, 'README screenshots: run with HM_SCREENSHOTS=1');

  for (const theme of THEMES) {
    test(`gate, yard walk and desk in the ${theme.name} theme`, async ({ page }) => {
      test.setTimeout(180_000);
      await signInWithTheme(page, 'driver', theme);
      await expect(page).toHaveURL(/\/gate$/);
      const { id: trailerId } = await reeferOnTheRoad();
      await page.goto(`/gate/trailers/${trailerId}`);
      await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
      await shoot(page, 'gate', theme.name);
      await page.context().clearCookies();

      const { rowName } = await walkRowFixture();
      const [row] = await db.select().from(yardRows).where(eq(yardRows.name, rowName));
      const [jockey] = await db.select().from(users).where(eq(users.email, 'jockey@bramblecrest.example'));
      const [walk] = await db
        .insert(yardWalks)
        .values({ terminalId: row.terminalId, startedById: jockey.id, rowIds: [row.id] })
        .returning({ id: yardWalks.id });
      await signInWithTheme(page, 'jockey', theme);
      await expect(page).toHaveURL(/\/yard$/);
      await page.goto(`/yard/walks/${walk.id}`);
      await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
      await shoot(page, 'yard-walk', theme.name);
      await page.context().clearCookies();

      await signInWithTheme(page, 'clerk', theme);
      await expect(page).toHaveURL(/\/desk$/);
      // past the header and the filters to the cases themselves, the part a clerk reads
      const filters = page.getByRole('button', { name: 'Show cases' });
      await filters.evaluate((el) =>
        window.scrollTo(0, el.getBoundingClientRect().bottom + window.scrollY + 16),
      );
      await shoot(page, 'desk', theme.name);
    });
  }
});
