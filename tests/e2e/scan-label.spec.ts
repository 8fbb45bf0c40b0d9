import { expect, test, type Page } from '@playwright/test';
import { LabelPage } from './pages/label-page';
import { ACCOUNTS, SignInPage, type AccountName } from './pages/sign-in-page';
import {
  code39Image,
  launchWithCamera,
  WIDE_FRAME,
  writeImageVideo,
  writeLabelVideo,
} from './support/fake-camera';

async function signInAs(page: Page, name: AccountName) {
  await new SignInPage(page).signIn(name);
  await expect(page).toHaveURL(new RegExp(`${ACCOUNTS[name].home}$`));
}

test('a driver scans a real label with the camera and lands on that trailer’s handoff start', async ({
  page,
}) => {
  test.slow(); // launches its own browser with a fake camera
  // the clerk's label page renders the label; its link is what the QR on the trailer encodes
  await signInAs(page, 'clerk');
  const labels = new LabelPage(page);
  const trailerId = await labels.trailerId('R53040');
  await labels.open(trailerId);
  await expect(page.getByRole('figure', { name: 'Label for trailer R53040' })).toBeVisible();
  const video = await writeLabelVideo(await labels.link(), '.data/e2e-label-R53040.y4m');

  const camera = await launchWithCamera(video);
  try {
    const driver = camera.page;
    await signInAs(driver, 'driver');
    await driver.getByRole('button', { name: 'Scan trailer label' }).click();
    await expect(driver).toHaveURL(new RegExp(`/gate/trailers/${trailerId}$`), { timeout: 30_000 });
  } finally {
    await camera.browser.close();
  }
});

test('a driver scans a VIN barcode (Code 39 with the leading I marker) when the label is gone', async ({
  page,
}) => {
  test.slow(); // launches its own browser with a fake camera
  await signInAs(page, 'driver');
  const found = await (await page.request.get('/api/trailers/lookup?unit=R53045')).json();
  const video = await writeImageVideo(
    code39Image(`I${found.trailer.vin}`),
    '.data/e2e-vin-R53045.y4m',
    WIDE_FRAME,
  );
  const camera = await launchWithCamera(video);
  try {
    await signInAs(camera.page, 'driver');
    await camera.page.getByRole('button', { name: 'Scan trailer label' }).click();
    await expect(camera.page).toHaveURL(new RegExp(`/gate/trailers/${found.trailer.id}$`), {
      timeout: 30_000,
    });
  } finally {
    await camera.browser.close();
  }
});

test('a code that is not a label shows what was read and offers typing', async () => {
  test.slow(); // launches its own browser with a fake camera
  const camera = await launchWithCamera(await writeLabelVideo('SLOT B07', '.data/e2e-unknown-code.y4m'));
  try {
    const driver = camera.page;
    await signInAs(driver, 'driver');
    await driver.getByRole('button', { name: 'Scan trailer label' }).click();
    await expect(driver.getByText('That code is not a Hitchmark label or a VIN barcode.')).toBeVisible({
      timeout: 30_000,
    });
    await expect(driver.getByText('Read: SLOT B07')).toBeVisible();
    await driver.getByLabel('Or type the unit number or VIN').fill('r53041');
    await driver.getByRole('button', { name: 'Find trailer' }).click();
    await expect(driver).toHaveURL(/\/gate\/trailers\/[0-9a-f-]{36}$/);
  } finally {
    await camera.browser.close();
  }
});

test('with no camera the gate says so and the typed lookup still works', async ({ page }) => {
  // the camera code (@zxing/browser; its option name tryPlayVideoTimeout survives minifying) loads only on demand
  const scannerChunks: string[] = [];
  page.on('response', async (response) => {
    if (!response.url().endsWith('.js')) return;
    if ((await response.text().catch(() => '')).includes('tryPlayVideoTimeout'))
      scannerChunks.push(response.url());
  });
  await signInAs(page, 'driver');
  await expect(page.getByRole('button', { name: 'Scan trailer label' })).toBeVisible();
  await page.waitForLoadState('networkidle');
  expect(scannerChunks).toEqual([]);
  await page.getByRole('button', { name: 'Scan trailer label' }).click();
  await expect.poll(() => scannerChunks.length).toBeGreaterThan(0);
  // headless Chromium without the fake device has no camera at all
  await expect(page.getByRole('alert').filter({ hasText: 'No camera found' })).toBeVisible();
  await page.getByLabel('Or type the unit number or VIN').fill('R99999');
  await page.getByRole('button', { name: 'Find trailer' }).click();
  await expect(page.getByText('No trailer with unit number R99999.')).toBeVisible();
});

test('a re-issued label’s old link says it was replaced; a forged link is refused', async ({ page }) => {
  await signInAs(page, 'clerk');
  const labels = new LabelPage(page);
  const trailerId = await labels.trailerId('R53042');
  await labels.open(trailerId);
  const oldLink = await labels.link();
  await labels.reissue();
  const newLink = await labels.link();
  expect(newLink).not.toBe(oldLink);

  await page.goto(new URL(oldLink).pathname);
  await expect(
    page.getByText(/^This label was replaced on \w{3} \d{1,2}, \d{4}; use the new label\.$/),
  ).toBeVisible();

  const token = new URL(newLink).pathname.slice(3);
  const forged = token.slice(0, 20) + (token[20] === 'A' ? 'B' : 'A') + token.slice(21);
  await page.goto(`/l/${forged}`);
  await expect(page.getByText('This label is not a Hitchmark label or it is damaged.')).toBeVisible();
  await page.goto('/l/not*a*token');
  await expect(page.getByText('This label is not a Hitchmark label or it is damaged.')).toBeVisible();

  // the new label opens the handoff start page (the clerk may use the gate)
  await page.goto(new URL(newLink).pathname);
  await expect(page).toHaveURL(new RegExp(`/gate/trailers/${trailerId}$`));
});

test('the lookup API answers each case with the right status and a clear message', async ({
  page,
  request,
}) => {
  expect((await request.get('/api/trailers/lookup?unit=R53001')).status()).toBe(401);
  await signInAs(page, 'driver');
  const api = page.request;
  const byUnit = await api.get('/api/trailers/lookup?unit=r53001');
  expect(byUnit.status()).toBe(200);
  const { trailer, via } = await byUnit.json();
  expect(via).toBe('unit');
  expect(Object.keys(trailer).sort()).toEqual(['id', 'kind', 'ownerScac', 'status', 'unitNumber', 'vin']);
  // a scanned Code 39 VIN may carry a leading I marker (common practice)
  const byVin = await api.get(`/api/trailers/lookup?vin=I${trailer.vin}`);
  expect(await byVin.json()).toMatchObject({ trailer: { id: trailer.id }, via: 'vin' });

  // 49 CFR 565.15(c): change the 9th character so the check digit no longer matches
  const wrong = trailer.vin.slice(0, 8) + (trailer.vin[8] === '0' ? '1' : '0') + trailer.vin.slice(9);
  const badVin = await api.get(`/api/trailers/lookup?vin=${wrong}`);
  expect(badVin.status()).toBe(422);
  expect((await badVin.json()).message).toMatch(/check digit/);

  expect((await api.get('/api/trailers/lookup')).status()).toBe(422);
  expect((await api.get(`/api/trailers/lookup?unit=R53001&vin=${trailer.vin}`)).status()).toBe(422);
  expect((await api.get('/api/trailers/lookup?unit=R99999')).status()).toBe(404);
  // drivers look trailers up but do not print labels
  expect((await api.get(`/trailers/labels/pdf?ids=${trailer.id}`)).status()).toBe(403);
  const forged = await api.get(`/api/trailers/lookup?token=${'A'.repeat(68)}`);
  expect(forged.status()).toBe(422);
  expect(await forged.json()).toMatchObject({
    code: 'invalid',
    message: 'This label is not a Hitchmark label or it is damaged.',
  });
});

test('a revoked label token gets 410 from the lookup API; a clerk downloads the PDF', async ({ page }) => {
  await signInAs(page, 'clerk');
  const labels = new LabelPage(page);
  const trailerId = await labels.trailerId('R53043');
  await labels.open(trailerId);
  const oldToken = new URL(await labels.link()).pathname.slice(3);
  await labels.reissue();
  const gone = await page.request.get(`/api/trailers/lookup?token=${oldToken}`);
  expect(gone.status()).toBe(410);
  expect((await gone.json()).message).toMatch(/^This label was replaced on/);

  const pdf = await page.request.get(`/trailers/labels/pdf?ids=${trailerId}`);
  expect(pdf.status()).toBe(200);
  expect(pdf.headers()['content-type']).toBe('application/pdf');
  expect((await pdf.body()).subarray(0, 5).toString()).toBe('%PDF-');
  expect((await page.request.get('/trailers/labels/pdf?ids=R53043')).status()).toBe(422);
});

test('a label scanned while signed out opens sign-in first, then the trailer', async ({
  page,
  browser,
  baseURL,
}) => {
  await signInAs(page, 'clerk');
  const labels = new LabelPage(page);
  const trailerId = await labels.trailerId('R53044');
  await labels.open(trailerId);
  const path = new URL(await labels.link()).pathname;

  const context = await browser.newContext({ baseURL });
  try {
    const phone = await context.newPage();
    await phone.goto(path);
    await expect(phone).toHaveURL(/\/login\?next=%2Fl%2F/);
    await new SignInPage(phone).fill('driver', ACCOUNTS.driver.id, ACCOUNTS.driver.secret);
    await expect(phone).toHaveURL(new RegExp(`/gate/trailers/${trailerId}$`));
  } finally {
    await context.close();
  }
});

test('the row chooser lists the clerk’s own terminal first, and its first row link prints that row', async ({
  page,
}) => {
  // the clerk's home terminal is Riverbend; both terminals have a "Row A"
  await signInAs(page, 'clerk');
  await page.goto('/trailers/labels');
  const terminals = page.getByRole('heading', { level: 2 });
  await expect(terminals).toHaveText(['Riverbend terminal', 'High Mesa terminal']);
  const first = page.getByRole('link', { name: /^Row / }).first();
  await expect(first).toHaveAccessibleName(/^Row A, Riverbend terminal: \d+ trailers$/);
  await first.click();
  await expect(page.getByRole('heading', { name: 'Labels for Riverbend terminal, Row A' })).toBeVisible();
  await expect(page.getByRole('figure', { name: /^Label for trailer / }).first()).toBeVisible();
});
