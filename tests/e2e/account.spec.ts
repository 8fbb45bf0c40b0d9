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
