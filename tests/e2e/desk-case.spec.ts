// The settlement desk end to end: a drop with new damage (through the gate's API) opens a case;
// the clerk sees both photos and the reason, notifies; the carrier's driver disputes; the clerk
// decides a shared charge; both e-mails arrive at the SMTP fake.
import { expect, test, type Browser } from '@playwright/test';
import { DeskCasePage } from './pages/desk-case-page';
import { SignInPage, type AccountName } from './pages/sign-in-page';
import { allOkItems, solidPng, submitHandoff, untouchedTrailer, uploadPhoto } from './support/handoff-api';

const inbox = `http://127.0.0.1:${process.env.HM_MAIL_HTTP_PORT ?? 2580}/messages`;
type Mail = { to: string[]; subject: string; text: string };

async function mailTo(address: string, subject: RegExp): Promise<Mail> {
  let found: Mail | undefined;
  await expect
    .poll(
      async () => {
        const all = (await (await fetch(inbox)).json()) as Mail[];
        found = all.find((m) => m.to.includes(address) && subject.test(m.subject));
        return !!found;
      },
      { timeout: 20_000 },
    )
    .toBe(true);
  return found!;
}

async function signedIn(browser: Browser, name: AccountName, baseURL: string) {
  const context = await browser.newContext({ baseURL, viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  await new SignInPage(page).signIn(name);
  await expect(page.getByRole('button', { name: 'Sign out' })).toBeVisible();
  return page;
}

test('a damage case from drop to shared decision, with e-mails through the outbox', async ({
  browser,
  baseURL,
}) => {
  test.setTimeout(120_000);
  await fetch(inbox, { method: 'DELETE' });

  // Driver D2001 (Osterlind, SCAC OSFW) drops, hooks, and drops again with a torn left side skin.
  const driver = await signedIn(browser, 'outsideDriver', baseURL!);
  const { trailer, carrierId: osfw } = await untouchedTrailer('OSFW');
  const ok = allOkItems(trailer);
  await submitHandoff(driver.request, trailer.id, osfw, 'drop', ok);
  const beforePhoto = await uploadPhoto(
    driver.request,
    trailer.id,
    'left_side.skin',
    solidPng([40, 160, 60]),
  );
  await submitHandoff(driver.request, trailer.id, osfw, 'hook', {
    ...ok,
    'left_side.skin': { ...ok['left_side.skin'], photoIds: [beforePhoto] },
  });
  // the after photo tells when it was taken (EXIF, as a phone's camera writes it); the before one does not
  const taken = new Date(Math.floor((Date.now() - 10 * 60_000) / 1000) * 1000);
  const afterPhoto = await uploadPhoto(
    driver.request,
    trailer.id,
    'left_side.skin',
    solidPng([200, 30, 30]),
    taken,
  );
  await submitHandoff(driver.request, trailer.id, osfw, 'drop', {
    ...ok,
    'left_side.skin': {
      condition: 'damaged',
      isInsulationShowing: false,
      note: 'Skin torn behind the landing gear',
      photoIds: [afterPhoto],
    },
  });

  // The clerk opens the case: both photos side by side, conditions, and the engine's reason.
  const clerk = await signedIn(browser, 'clerk', baseURL!);
  const desk = new DeskCasePage(clerk);
  await desk.openFromQueue(trailer.unitNumber);
  const pair = desk.evidence('Left side skin');
  await expect(pair.getByTestId('condition')).toHaveText(['ok', 'damaged (needs repair)']);
  const before = await desk.photoLoaded(/Left side skin, before/);
  const after = await desk.photoLoaded(/Left side skin, after/);
  const [b, a] = [await before.boundingBox(), await after.boundingBox()];
  // side by side: the two photos share a horizontal band, before on the left of after
  expect(a!.y < b!.y + b!.height && b!.y < a!.y + a!.height).toBe(true);
  expect(b!.x + b!.width).toBeLessThanOrEqual(a!.x);
  await expect(pair.getByText(/only Osterlind Freightways held the trailer/)).toBeVisible();
  // beside each photo, when it was taken (where the phone said) and when it was uploaded
  await expect(pair.getByTestId('photo-times')).toHaveText([
    /^no capture time in the photo · uploaded \w{3} \d{1,2}, \d{4}, \d{2}:\d{2} \w+$/,
    /^taken \w{3} \d{1,2}, \d{4}, \d{2}:\d{2} \w+ · uploaded \w{3} \d{1,2}, \d{4}, \d{2}:\d{2} \w+$/,
  ]);
  await expect(clerk.getByRole('img', { name: /Trailer diagram\. Damage at: Left side/ })).toBeVisible();
  await expect(clerk.getByText('Estimate $850.00 from the rate card')).toBeVisible();

  await desk.submit('Notify the carrier', 'Notify carrier', 'notified');
  const notice = await mailTo(
    'equipment@osterlind.example',
    new RegExp(`Damage case for trailer ${trailer.unitNumber}`),
  );
  expect(notice.text).toContain('Left side skin: ok → damaged (needs repair)');
  expect(notice.text).toContain('Repair estimate: $850.00.');
  const link = /(http\S+\/case-link\/\S+)/.exec(notice.text)?.[1];
  expect(link).toBeTruthy();

  // The signed link opens the evidence summary without an account.
  const anon = await browser.newContext();
  const linkPage = await anon.newPage();
  await linkPage.goto(link!.replace(/^http:\/\/localhost:\d+/, baseURL!));
  await expect(
    linkPage.getByRole('heading', { name: `Damage case: trailer ${trailer.unitNumber}` }),
  ).toBeVisible();
  await anon.close();

  // The carrier's driver disputes from the desk.
  const mine = new DeskCasePage(driver);
  await mine.openFromQueue(trailer.unitNumber);
  await mine
    .form('Dispute this case')
    .getByLabel('Why is this damage not yours?')
    .fill('The skin was already torn when I hooked it; see my pickup photo.');
  await mine.submit('Dispute this case', 'Send dispute', 'disputed');

  // The clerk decides a shared charge.
  await clerk.reload();
  await expect(clerk.getByRole('heading', { level: 1 })).toContainText('disputed');
  const decide = desk.form('Decide');
  // a refused decision shows its message under the input it concerns and keeps what was typed
  const charged = decide.getByLabel(/Charged to the carrier/);
  await decide.getByRole('radio', { name: 'share' }).check();
  await charged.fill('900.00');
  await decide.getByLabel('Reason').fill('Split it.');
  await decide.getByRole('button', { name: 'Record decision' }).click();
  await expect(charged).toHaveAccessibleDescription(
    'A shared charge is more than zero and less than the estimate.',
  );
  await expect(charged).toHaveAttribute('aria-invalid', 'true');
  await expect(charged).toHaveValue('900.00');
  await expect(clerk.getByRole('heading', { level: 1 })).toContainText('disputed');
  await decide.getByRole('radio', { name: 'share' }).check();
  await decide.getByLabel(/Charged to the carrier/).fill('425.00');
  await decide.getByLabel('Reason').fill('The hook photo is unclear on that panel; we split the repair.');
  await desk.submit('Decide', 'Record decision', 'decided');
  await expect(clerk.getByText(/decided: share, charged \$425\.00/)).toBeVisible();

  const decision = await mailTo(
    'equipment@osterlind.example',
    new RegExp(`Decision on the damage case for trailer ${trailer.unitNumber}`),
  );
  expect(decision.text).toContain('Charged to your company: $425.00.');
  expect(decision.text).toContain('shared');
  await driver.context().close();
  await clerk.context().close();
});

test('reports CSV: clerks get RFC 4180 CSV, bad input a 422, drivers a 403', async ({ browser, baseURL }) => {
  const clerk = await signedIn(browser, 'clerk', baseURL!);
  const csv = await clerk.request.get('/api/desk/reports.csv?months=12');
  expect(csv.status()).toBe(200);
  expect(csv.headers()['content-type']).toContain('text/csv');
  const text = await csv.text();
  expect(text.split('\r\n')[0]).toBe(
    'month,carrier,cases,estimate_usd,charged_usd,absorbed_usd,waived_usd,open_usd',
  );
  expect(text.split('\r\n').length).toBeGreaterThan(2); // the seed's cases are in it
  const bad = await clerk.request.get('/api/desk/reports.csv?months=banana');
  expect(bad.status()).toBe(422);
  expect(await bad.json()).toMatchObject({ code: 'invalid' });
  await clerk.goto('/desk/reports');
  await expect(clerk.getByRole('img', { name: /^By carrier:/ })).toBeVisible();
  const driver = await signedIn(browser, 'outsideDriver', baseURL!);
  expect((await driver.request.get('/api/desk/reports.csv')).status()).toBe(403);
  await clerk.context().close();
  await driver.context().close();
});
