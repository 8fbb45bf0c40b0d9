import { expect, test } from '@playwright/test';
import { pool } from '../../db';
import { SignInPage } from './pages/sign-in-page';
import { YardMovePage } from './pages/yard-move-page';
import { YardWalkPage } from './pages/yard-walk-page';
import { launchWithCamera, writeLabelVideo } from './support/fake-camera';
import { labelLinkFor, walkRowFixture } from './support/yard-state';

test.afterAll(async () => {
  await pool.end();
});

test('a jockey walks a row: one missing, one in the wrong slot, one unknown label; accepting the correction updates the board', async ({
  page,
  context,
}) => {
  test.setTimeout(90_000); // two browsers: this phone and a second one with a fake camera
  // board: slot 1 = unit 1, slot 2 = unit 2, slot 3 = unit 3, slot 4 empty
  const { rowName, tag, slots, units, trailerIds } = await walkRowFixture();
  await new SignInPage(page).signIn('jockey');
  await expect(page).toHaveURL(/\/yard$/);
  const walk = new YardWalkPage(page);
  await walk.start(rowName);
  // nothing typed yet: the message sits under the unit field, nothing is queued
  await page.getByRole('button', { name: 'Record scan' }).click();
  await expect(page.getByLabel('Unit', { exact: true })).toHaveAccessibleDescription(
    /Scan or type the unit first\./,
  );
  await expect(walk.scans()).toHaveCount(0);

  // the first slot of the row is suggested, then the next one in row order
  await expect(page.getByLabel('Slot', { exact: true })).toHaveValue(/.+/);
  await expect(page.getByLabel('Slot', { exact: true }).locator('option:checked')).toHaveText(slots[0]);
  await walk.scan(units[0], slots[0], { fuelEighths: 2 });
  await expect(walk.scans().filter({ hasText: `${slots[0]}: ${units[0]} · Sent` })).toHaveCount(1);
  await expect(page.getByLabel('Slot', { exact: true }).locator('option:checked')).toHaveText(slots[1]);

  // offline: the scan waits on the device and goes out when the connection returns
  await context.setOffline(true);
  await walk.scan(`NOLABEL${tag}`, slots[1]);
  await expect(walk.scans().filter({ hasText: 'Waiting to send' })).toHaveCount(1);
  await expect(page.getByRole('button', { name: /send waiting scans first/ })).toBeDisabled();
  await context.setOffline(false);
  await expect(walk.scans().filter({ hasText: `${slots[1]}: NOLABEL${tag} (unknown) · Sent` })).toHaveCount(
    1,
  );

  // unit 3 stands in slot 4, not slot 3; unit 2 is nowhere. Unit 3's label is read by a second
  // phone's camera (fake camera fed the label's QR code) on the same walk.
  const video = await writeLabelVideo(await labelLinkFor(trailerIds[2]), `.data/e2e-walk-${tag}.y4m`);
  const camera = await launchWithCamera(video);
  try {
    const other = camera.page;
    await new SignInPage(other).signIn('jockey');
    await expect(other).toHaveURL(/\/yard$/);
    await other.goto(page.url());
    await other.getByRole('button', { name: 'Scan label' }).click();
    await expect(other.getByLabel('Unit', { exact: true })).toHaveValue(/\/l\//, { timeout: 15_000 });
    const otherWalk = new YardWalkPage(other);
    await otherWalk.scan('', slots[3], { keepUnit: true });
    await expect(otherWalk.scans().filter({ hasText: `${slots[3]}: ${units[2]} · Sent` })).toHaveCount(1);
  } finally {
    await camera.browser.close();
  }
  await page.reload();
  await expect(walk.scans().filter({ hasText: 'Sent' })).toHaveCount(3);
  await walk.finish();

  await expect(walk.count('matched')).toHaveText('1');
  await expect(walk.count('wrong_slot')).toHaveText('1');
  await expect(walk.count('missing')).toHaveText('1');
  await expect(walk.count('unknown')).toHaveText('1');
  await expect(walk.count('duplicate')).toHaveText('0');
  await expect(page.getByRole('region', { name: 'Wrong slot' })).toContainText(
    `${units[2]}: board says ${slots[2]}, seen in ${slots[3]}`,
  );
  await expect(page.getByRole('region', { name: 'Missing' })).toContainText(
    `${units[1]}: expected in ${slots[1]}, not found`,
  );
  await expect(page.getByRole('region', { name: 'Unknown' })).toContainText(`NOLABEL${tag}`);

  await page.getByRole('button', { name: `Accept: move to ${slots[3]}` }).click();
  await expect(page.getByRole('region', { name: 'Wrong slot' })).toContainText('Board corrected');

  // the low fuel reading became a task
  await page.goto('/yard/tasks');
  await expect(page.getByText(`Fuel the reefer: ${units[0]} in ${slots[0]}`)).toBeVisible();

  await page.goto('/yard');
  const map = page.getByTestId('yard-map');
  await expect(map.locator(`[data-spot="${slots[3]}"]`)).toContainText(units[2]);
  await expect(map.locator(`[data-spot="${slots[2]}"]`)).toContainText('free');
});

test('a move into an occupied slot is refused naming the occupant; the board shows a good move', async ({
  page,
}) => {
  const { tag, slots, units } = await walkRowFixture();
  await new SignInPage(page).signIn('jockey');
  await expect(page).toHaveURL(/\/yard$/);
  const moves = new YardMovePage(page);
  await moves.open();
  // two typos at once: each message sits under its own field
  await moves.move(`NOUNIT${tag}`, `NOSLOT${tag}`);
  await expect(moves.unit()).toHaveAccessibleDescription(/No trailer with that unit number, VIN or label\./);
  await expect(moves.target()).toHaveAccessibleDescription('No such slot or door in this yard.');
  await moves.move(units[0], slots[1]);
  await expect(page.getByText(`${slots[1]} is occupied by ${units[1]}`)).toBeVisible();
  await moves.move(units[0], slots[3]);
  await expect(
    page.getByRole('status').filter({ hasText: `Moved ${units[0]} from ${slots[0]} to ${slots[3]}.` }),
  ).toBeVisible();
  await page.goto('/yard');
  await expect(page.getByTestId('yard-map').locator(`[data-spot="${slots[3]}"]`)).toContainText(units[0]);
});

test('the CSV export carries the table columns and rows; bad input gets a clear 4xx', async ({ page }) => {
  const { slots, units } = await walkRowFixture();
  await new SignInPage(page).signIn('clerk');
  await expect(page).toHaveURL(/\/desk$/);
  const csv = await page.request.get('/api/yard/board.csv?sort=unit&dir=asc');
  expect(csv.status()).toBe(200);
  expect(csv.headers()['content-type']).toContain('text/csv');
  const lines = (await csv.text()).split('\r\n');
  expect(lines[0]).toBe('Unit,Slot,Loaded/empty,Reefer,Fuel,Holds,Dwell,Gate in,Last seen');
  // the fixture's first trailer: loaded reefer at 34.0 °F, 6/8 fuel, gated in an hour ago
  expect(lines.find((l) => l.startsWith(`${units[0]},`))).toMatch(
    new RegExp(`^${units[0]},${slots[0]},Loaded,"On, 34\\.0 °F",6/8,None,1 h 0\\d min,`),
  );

  expect((await page.request.get('/api/yard/board.csv?filter=bogus')).status()).toBe(422);
  const notJson = await page.request.post('/api/yard/moves', {
    headers: { 'content-type': 'application/json' },
    data: Buffer.from('{not json'),
  });
  expect(notJson.status()).toBe(400);
  const empty = await page.request.post('/api/yard/moves', { data: { unit: '', target: 'A01' } });
  expect(empty.status()).toBe(422);
  expect((await empty.json()).fieldErrors.unit[0]).toBe('Scan or type the unit number.');
  const badScan = await page.request.post('/api/yard/walks/00000000-0000-4000-8000-000000000000/scans', {
    data: { clientKey: 'short' },
  });
  expect(badScan.status()).toBe(422);
});

test('an admin adds a row; a taken name is refused under the name field, the typed name kept', async ({
  page,
}) => {
  const { rowName } = await walkRowFixture();
  await new SignInPage(page).signIn('admin');
  await expect(page).toHaveURL(/\/desk$/);
  await page.goto('/admin/yard');
  const name = page.getByLabel('New row name');
  await name.fill(rowName);
  await page.getByRole('button', { name: 'Add row' }).click();
  await expect(name).toHaveAccessibleDescription(`A row named ${rowName} already exists.`);
  await expect(name).toHaveAttribute('aria-invalid', 'true');
  await expect(name).toHaveValue(rowName);
});
