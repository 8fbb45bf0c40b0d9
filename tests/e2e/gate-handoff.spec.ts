import { expect, test, type Page } from '@playwright/test';
import { PNG } from 'pngjs';
import { HandoffFormPage } from './pages/handoff-form-page';
import { LabelPage } from './pages/label-page';
import { ACCOUNTS, SignInPage, type AccountName } from './pages/sign-in-page';
import { launchWithCamera, writeLabelVideo } from './support/fake-camera';

// R53186 is a seeded reefer out on the road whose history ends with a hook (db/seed/history.ts):
// every item has an earlier ok record, so damage recorded now is new damage.
const UNIT = 'R53186';
const MAIL = `http://127.0.0.1:${process.env.HM_MAIL_HTTP_PORT ?? 2580}/messages`;
const shots = process.env.HM_SCREENSHOTS === '1';

async function signInAs(page: Page, name: AccountName) {
  await new SignInPage(page).signIn(name);
  await expect(page).toHaveURL(new RegExp(`${ACCOUNTS[name].home}$`));
}

function smallPng(): Buffer {
  const png = new PNG({ width: 64, height: 48 });
  for (let i = 0; i < png.data.length; i += 4) png.data.set([(i / 4) % 256, 120, 40, 255], i);
  return PNG.sync.write(png);
}

test('drop with new damage and a photo, receipt with findings and holds, refused hook, receipt e-mail', async ({
  page,
}) => {
  test.setTimeout(240_000); // launches its own browser with a fake camera
  await fetch(MAIL, { method: 'DELETE' });

  // the clerk's label page gives the link the trailer's QR label encodes
  await signInAs(page, 'clerk');
  const labels = new LabelPage(page);
  const trailerId = await labels.trailerId(UNIT);
  await labels.open(trailerId);
  const video = await writeLabelVideo(await labels.link(), `.data/e2e-label-${UNIT}.y4m`, { scale: 6 });

  const camera = await launchWithCamera(video);
  let code = '';
  try {
    const driver = camera.page;
    camera.context.setDefaultTimeout(15_000);
    await signInAs(driver, 'driver');
    await driver.getByRole('button', { name: 'Scan trailer label' }).click();
    // decoding the fake camera's frames takes longer on a loaded machine
    await expect(driver).toHaveURL(new RegExp(`/gate/trailers/${trailerId}$`), { timeout: 60_000 });
    await expect(driver.getByRole('heading', { name: `Drop (gate in): ${UNIT}` })).toBeVisible();

    const form = new HandoffFormPage(driver);
    await form.fillHeader({ tractor: 'T-4411', loaded: false });
    await form.fillReefer({ fuel: 'Full 8/8', setpoint: '34', returnAir: '36', engineHours: '9100' });
    await form.sameAsLastEverywhere();
    await form.openStep('Safety checks');
    await expect(driver.getByRole('note', { name: 'Before going under the trailer' }).first()).toBeVisible();
    await form.answerSafety(10);

    // a tap that answers a step opens the next one: the safety statements lead to the rest of the box
    await expect(form.stepHeading('The rest of the box')).toBeVisible();
    await form.showItems('Left side');
    const skin = form.item('Left side skin');
    await form.choose('Left side skin: condition', 'Damaged', skin);
    await expect(skin.getByText('New or worse damage: add a photo and a note.')).toBeVisible();
    await form.choose('Insulation showing?', 'Yes, showing', skin);
    await skin
      .getByLabel('Note: what do you see?')
      .fill('Skin torn about 30 cm above the rear tandem; insulation showing.');
    await skin
      .getByLabel('Photo of Left side skin')
      .setInputFiles({ name: 'skin.png', mimeType: 'image/png', buffer: smallPng() });
    await expect(skin.getByRole('img', { name: 'Photo of Left side skin' })).toBeVisible({ timeout: 15_000 });
    await expect(skin.getByLabel('Left side skin: last record and now')).toContainText('New damage');

    await form.openStep('Safety checks');
    await form.showItems('Tandem locking pins');
    const pin = form.item('Tandem locking pin, left rear');
    await form.choose('Tandem locking pin, left rear: engaged?', 'Not engaged', pin);

    await form.submit('drop');
    await expect(driver).toHaveURL(/\/gate\/receipts\/[0-9a-f-]{36}$/, { timeout: 20_000 });
    const findings = driver.getByRole('region', { name: 'Findings' });
    await expect(findings).toContainText('New damage: Left side skin');
    await expect(findings).toContainText('Locking pin not engaged');
    const holds = driver.getByRole('region', { name: 'Holds' });
    await expect(holds).toContainText(
      'Out of service: may not leave the gate. Tandem locking pin, left rear is not engaged.',
    );
    await expect(holds).toContainText('Restricted: no perishable loads');
    // the thumbnail is really served (photo storage and permission check)
    const thumb = driver.getByRole('region', { name: /Photos/ }).getByRole('img');
    await expect(thumb).toHaveCount(1);
    await expect.poll(() => thumb.evaluate((img: HTMLImageElement) => img.naturalWidth)).toBeGreaterThan(0);
    code = (await driver.getByTestId('verification-code').innerText()).trim();
    expect(code).toMatch(/^[0-9A-HJKMNP-TV-Z]{4}-[0-9A-HJKMNP-TV-Z]{4}$/);
    if (shots) await driver.screenshot({ path: 'docs/screenshots/gate-receipt.png', fullPage: true });
  } catch (error) {
    await camera.page
      .screenshot({ path: '.data/test-results/gate-handoff-camera-failure.png', fullPage: true })
      .catch(() => undefined);
    throw error;
  } finally {
    await camera.browser.close();
  }

  // an outside carrier's driver tries to hook the held trailer: refused before the form
  await new SignInPage(page).signOut();
  await signInAs(page, 'outsideDriver');
  await page.goto(`/gate/trailers/${trailerId}`);
  await expect(page.getByText('Hook refused')).toBeVisible();
  await expect(page.getByRole('region', { name: 'Why' })).toContainText(
    'Tandem locking pin, left rear is not engaged.',
  );
  await expect(page.getByRole('note', { name: 'Out of service' })).toContainText('qualified technician');
  await expect(page.getByRole('button', { name: 'Record the hook' })).toHaveCount(0);
  if (shots) await page.screenshot({ path: 'docs/screenshots/gate-refused.png', fullPage: true });

  // the receipt e-mail reached the local inbox, to the carrier (D1001 has no e-mail address)
  let mail: { to: string[]; subject: string; text: string } | undefined;
  await expect
    .poll(
      async () => {
        const list = (await (await fetch(MAIL)).json()) as { to: string[]; subject: string; text: string }[];
        mail = list.find((m) => m.subject.includes(UNIT));
        return Boolean(mail);
      },
      { timeout: 20_000 },
    )
    .toBe(true);
  expect(mail!.to).toEqual(['claims@bramblecrest.example']);
  expect(mail!.text).toContain(`Trailer: ${UNIT}`);
  expect(mail!.text).toContain(`Verification code: ${code}`);
  expect(mail!.text).toContain('Tandem locking pin, left rear is not engaged.');

  // the public verify page confirms the code without signing in
  await new SignInPage(page).signOut();
  await page.goto(`/verify?code=${encodeURIComponent(code.toLowerCase())}`);
  await expect(page.getByText('This receipt is genuine')).toBeVisible();
  await expect(page.getByRole('article', { name: 'Handoff receipt' })).toContainText(UNIT);
  await expect(page.getByRole('article').getByRole('img')).toHaveCount(0);
});

test('a draft survives a reload, and a drop submitted offline is sent when the connection returns', async ({
  page,
  context,
}) => {
  test.setTimeout(90_000);
  // R53191: another seeded reefer on the road with an ok history (db/seed/history.ts)
  await signInAs(page, 'driver');
  const id = await new LabelPage(page).trailerId('R53191');
  await page.goto(`/gate/trailers/${id}`);
  const form = new HandoffFormPage(page);
  await form.openStep('Who and what');
  await page.getByLabel('Seal number').fill('SL-88123');
  await form.fillHeader({ tractor: 'T-5120', loaded: true });
  await form.fillReefer({ fuel: '6/8', setpoint: '-10', returnAir: '-8', engineHours: '9400' });
  await form.sameAsLastEverywhere();
  await form.answerSafety(9);

  await page.reload();
  // a restored draft opens at its first unanswered step: here, the confirmation
  await expect(form.stepHeading('Confirm')).toBeVisible();
  await form.openStep('Who and what');
  await expect(page.getByLabel('Tractor number')).toHaveValue('T-5120');
  await expect(page.getByLabel('Seal number')).toHaveValue('SL-88123');
  await form.openStep('Fuel');
  await expect(
    page.getByRole('group', { name: 'Fuel in eighths' }).getByRole('button', { name: '6/8' }),
  ).toHaveAttribute('aria-pressed', 'true');

  await context.setOffline(true);
  await form.submit('drop');
  await expect(page.getByText('No connection: the handoff is saved on this phone')).toBeVisible();
  await context.setOffline(false);
  await expect(page).toHaveURL(/\/gate\/receipts\/[0-9a-f-]{36}$/, { timeout: 20_000 });
  // 6/8 at a drop is short of the policy's 8/8 (common practice: full at every drop and hook)
  await expect(page.getByRole('region', { name: 'Findings' })).toContainText('Fuel short');
});
