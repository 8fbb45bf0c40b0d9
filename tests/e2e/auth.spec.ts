import { expect, test } from '@playwright/test';
import { ACCOUNTS, SignInPage, type AccountName } from './pages/sign-in-page';

const roles: AccountName[] = ['admin', 'clerk', 'jockey', 'driver'];

for (const name of roles) {
  test(`${name} signs in, lands on the start page, and signs out`, async ({ page }) => {
    const signIn = new SignInPage(page);
    await signIn.signIn(name);
    await expect(page).toHaveURL(new RegExp(`${ACCOUNTS[name].home}$`));
    await expect(page.getByRole('button', { name: 'Sign out' })).toBeVisible();
    await signIn.signOut();
    // signed out: a private page sends us back to sign-in
    await page.goto(ACCOUNTS[name].home);
    await expect(page).toHaveURL(/\/login\?next=/);
  });
}

test('a wrong password is refused on the form with a clear message', async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.fill('staff', ACCOUNTS.clerk.id, 'not-the-password');
  await expect(page.getByText('That e-mail and password do not match.')).toBeVisible();
  await expect(page).toHaveURL(/\/login/);
});

test('malformed sign-in input gets field messages, not an error page', async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.fill('driver', '!!', '12');
  await expect(page.getByText('Enter your driver number (letters, digits, dashes).')).toBeVisible();
  await expect(page.getByText('Your PIN is 4 to 8 digits.')).toBeVisible();
});

const forbidden: [AccountName, string][] = [
  ['driver', '/admin'],
  ['driver', '/yard'],
  ['jockey', '/desk'],
  ['jockey', '/admin'],
  ['clerk', '/admin'],
];
for (const [name, path] of forbidden) {
  test(`${name} gets 403 on ${path}`, async ({ page }) => {
    await new SignInPage(page).signIn(name);
    await expect(page).toHaveURL(new RegExp(`${ACCOUNTS[name].home}$`));
    const response = await page.goto(path);
    expect(response?.status()).toBe(403);
    await expect(page.getByRole('heading', { name: 'Not for your role' })).toBeVisible();
  });
}

test('the next address after sign-in is followed only within the site', async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open('/trailers?q=R5300');
  await signIn.fill('staff', ACCOUNTS.clerk.id, ACCOUNTS.clerk.secret);
  await expect(page).toHaveURL(/\/trailers\?q=R5300$/);
  await signIn.signOut();
  await signIn.open('//elsewhere.example/');
  await signIn.fill('staff', ACCOUNTS.clerk.id, ACCOUNTS.clerk.secret);
  await expect(page).toHaveURL(/\/desk$/);
});

test('an API call without a session gets 401 JSON', async ({ request }) => {
  const response = await request.get('/api/trailers');
  expect(response.status()).toBe(401);
  expect(await response.json()).toMatchObject({ code: 'unauthenticated' });
});

test('a forged session cookie is not a session', async ({ browser, baseURL }) => {
  const context = await browser.newContext({ baseURL });
  await context.addCookies([{ name: 'hm_session', value: 'Fe26.2*forged', url: baseURL! }]);
  const page = await context.newPage();
  await page.goto('/desk');
  await expect(page).toHaveURL(/\/login/);
  await context.close();
});
