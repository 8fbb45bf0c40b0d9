// Screenshots of the yard for the README: board (phone and desktop) and a finished walk.
// Runs against a started app on the seeded dev database (APP_URL), signed in as the demo jockey.
// Usage: source scripts/env.sh && npx tsx scripts/screenshots-yard.ts
import { devices, type Page } from '@playwright/test';
import { launchChromium } from '../tests/support/chromium';

const base = process.env.APP_URL ?? 'http://localhost:3000';
const out = 'docs/screenshots';

async function signIn(page: Page) {
  await page.goto(`${base}/login`);
  await page.getByRole('tab', { name: 'Terminal staff' }).click();
  await page.getByLabel('E-mail').fill('jockey@bramblecrest.example');
  await page.getByLabel('Password').fill('hitchmark-jockey');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/yard$/);
}

const browser = await launchChromium();
try {
  const phone = await (await browser.newContext({ ...devices['Pixel 7'] })).newPage();
  await signIn(phone);
  await phone.getByTestId('yard-map').waitFor();
  await phone.screenshot({ path: `${out}/yard-board.png` });

  const desk = await (await browser.newContext({ viewport: { width: 1366, height: 900 } })).newPage();
  await signIn(desk);
  await desk.getByRole('tab', { name: 'Table' }).click();
  await desk.getByRole('checkbox', { name: 'Over free time' }).check();
  await desk.screenshot({ path: `${out}/yard-board-desktop.png` });

  // a walk of the first row: every trailer but one in place, one in the next slot, one unknown label
  const board = await (await phone.request.get(`${base}/api/yard/board`)).json();
  const row = board.rows[0];
  const spots = board.spots.filter((s: { rowId: string }) => s.rowId === row.id);
  await phone.goto(`${base}/yard/walks`);
  await phone.getByRole('checkbox', { name: row.name, exact: true }).check();
  await phone.getByRole('button', { name: 'Start walk' }).click();
  await phone.waitForURL(/\/yard\/walks\/[0-9a-f-]{36}$/);
  const occupied = spots.filter((s: { trailer: unknown }) => s.trailer);
  for (const [i, s] of occupied.entries()) {
    if (i === 1) continue; // missing
    const label = i === 2 ? occupied[1].label : s.label; // found where the missing one should be
    await phone.getByLabel('Unit', { exact: true }).fill(s.trailer.unitNumber);
    await phone.getByLabel('Slot', { exact: true }).selectOption({ label });
    if (i === 0) await phone.getByLabel('Fuel (eighths)').selectOption('2');
    await phone.getByRole('button', { name: 'Record scan' }).click();
  }
  await phone.getByLabel('Unit', { exact: true }).fill('ZX-0000');
  await phone.getByLabel('Slot', { exact: true }).selectOption({ label: spots[spots.length - 1].label });
  await phone.getByRole('button', { name: 'Record scan' }).click();
  await phone.getByRole('button', { name: 'Finish walk' }).click();
  await phone.getByRole('heading', { name: 'Reconciliation' }).waitFor();
  await phone.evaluate(() => window.scrollTo(0, 0));
  await phone.screenshot({ path: `${out}/yard-walk.png` });
} finally {
  await browser.close();
}
