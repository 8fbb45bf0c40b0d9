import { expect, test } from '@playwright/test';
import { SignInPage } from './pages/sign-in-page';

// Changing a PIN on one phone signs the same driver out on another and keeps this one signed in.
// Uses D4001 (an invented demo driver, PIN 1357, used by no other spec) and puts the PIN back.
test('a driver changes their PIN: the other phone is signed out, this one stays in', async ({ browser }) => {
  test.setTimeout(180_000); // three sign-ins and two changes, each a bcrypt hash on a shared machine
  const phoneA = await browser.newContext();
  const phoneB = await browser.newContext();
  const a = await phoneA.newPage();
  const b = await phoneB.newPage();
  const signIn = async (page: typeof a, pin: string) => {
    const form = new SignInPage(page);
    await form.open();
    await form.fill('driver', 'D4001', pin);
    await expect(page).toHaveURL(/\/gate$/);
  };
  const changePin = async (from: string, to: string) => {
    await a.goto('/account');
    await a.getByLabel('Current PIN').fill(from);
    await a.getByLabel('New PIN', { exact: true }).fill(to);
    await a.getByLabel('New PIN again').fill(to);
    await a.getByRole('button', { name: 'Save the new PIN' }).click();
    await expect(a.getByText('PIN changed. Other phones are signed out.')).toBeVisible();
  };
  await signIn(a, '1357');
  await signIn(b, '1357');

  await changePin('1357', '8642');
  // phone B's cookie is refused: back to sign-in
  await b.goto('/gate');
  await expect(b).toHaveURL(/\/login/);
  // phone A is still signed in
  const stay = await a.goto('/gate');
  expect(stay?.status()).toBe(200);
  await expect(a).toHaveURL(/\/gate$/);
  // and the new PIN is the one that signs in
  await signIn(b, '8642');

  await changePin('8642', '1357');
  await phoneA.close();
  await phoneB.close();
});

// A driver keeps an address for receipts. Uses D3001 (an invented demo driver, PIN 1357, used by
// no other spec) and removes the address again at the end.
test('a driver keeps an e-mail address for receipts; a bad or taken one is refused under the field', async ({
  page,
}) => {
  test.setTimeout(120_000);
  const form = new SignInPage(page);
  await form.open();
  await form.fill('driver', 'D3001', '1357');
  await expect(page).toHaveURL(/\/gate$/);
  await page.goto('/account');
  const email = page.getByLabel('E-mail for your receipts');
  const save = page.getByRole('button', { name: 'Save the e-mail address' });
  // the browser allows at most 254 characters, as the schema does (RFC 5321 §4.5.3.1)
  await expect(email).toHaveAttribute('maxlength', '254');

  // the browser accepts an address without a dot in its domain; the schema does not
  await email.fill('carmen@yard');
  await save.click();
  await expect(email).toHaveAccessibleDescription(/like name@example\.com, or leave it empty/);
  await expect(email).toHaveAttribute('aria-invalid', 'true');

  // an address another account signs in with is refused under the field, nothing saved
  await email.fill('admin@bramblecrest.example');
  await save.click();
  await expect(email).toHaveAccessibleDescription(/Another account already uses that e-mail address/);

  await email.fill('Carmen.Oyelaran@example.test');
  await save.click();
  await expect(page.getByText('Saved. Your receipts go to carmen.oyelaran@example.test.')).toBeVisible();
  await page.reload();
  await expect(email).toHaveValue('carmen.oyelaran@example.test');

  await email.fill('');
  await save.click();
  await expect(page.getByText("Removed. Receipts go to your carrier's contact only.")).toBeVisible();
  await page.reload();
  await expect(email).toHaveValue('');
});
