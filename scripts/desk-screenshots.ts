// Screenshots of the desk for the README: queue, a case, a trailer file, at phone and desktop
// widths. Needs a running app on APP_URL with the demo seed. `npx tsx scripts/desk-screenshots.ts`
import { devices } from '@playwright/test';
import { launchChromium } from '../tests/support/chromium';

const base = process.env.APP_URL ?? 'http://localhost:3000';
const out = process.env.SHOTS_DIR ?? 'docs/screenshots';
const only = process.argv[2];

const browser = await launchChromium();
for (const [suffix, options] of [
  ['', { ...devices['Pixel 7'] }],
  ['-desktop', { viewport: { width: 1366, height: 900 } }],
] as const) {
  const page = await (await browser.newContext({ ...options, baseURL: base })).newPage();
  await page.goto('/login');
  await page.getByRole('tab', { name: 'Terminal staff' }).click();
  await page.getByLabel('E-mail').fill('clerk@bramblecrest.example');
  await page.getByLabel('Password').fill('hitchmark-clerk');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/desk/);
  const shoot = async (name: string) => {
    if (only && only !== name) return;
    await page.getByRole('heading', { level: 1 }).waitFor();
    await page.waitForLoadState('networkidle');
    await page.screenshot({ path: `${out}/${name}${suffix}.png`, fullPage: true });
  };
  await shoot('desk-queue');
  await page.goto('/desk?state=disputed');
  await page.getByRole('list', { name: 'Cases' }).getByRole('link').first().click();
  await page.waitForURL(/\/desk\/cases\//);
  await page.waitForLoadState('networkidle');
  await shoot('desk-case');
  await page.getByRole('link', { name: 'Trailer file' }).click();
  await page.waitForURL(/\/trailers\//);
  await shoot('trailer-file');
  await page.goto('/desk/reports');
  await shoot('desk-reports');
  await page.context().close();
}
await browser.close();
