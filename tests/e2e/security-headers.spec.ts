import { expect, test, type Page } from '@playwright/test';
import { ACCOUNTS, SignInPage } from './pages/sign-in-page';
import { launchWithCamera, writeLabelVideo } from './support/fake-camera';

// Hole 10 of the evidence issue: the headers every answer carries, and a Content-Security-Policy
// strict enough to matter (nonce scripts, no eval in production) that still lets the app work:
// the sign-in form, the font, and the gate's camera scanner run with no violation reported.
// Header meanings: CSP Level 3 (W3C), RFC 6797 (HSTS), Fetch "X-Content-Type-Options",
// Referrer Policy (W3C), Permissions Policy (W3C).

/** Records every CSP violation the page reports, from its first script on. */
async function watchViolations(page: Page): Promise<string[]> {
  const seen: string[] = [];
  await page.exposeFunction('hmCspViolation', (text: string) => seen.push(text));
  await page.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (e) => {
      (window as unknown as { hmCspViolation: (t: string) => void }).hmCspViolation(
        `${e.violatedDirective} blocked ${e.blockedURI} (${e.sourceFile}:${e.lineNumber})`,
      );
    });
  });
  page.on('console', (m) => {
    if (/Content Security Policy/i.test(m.text())) seen.push(m.text());
  });
  return seen;
}

test('every page answer carries the security headers, with a fresh nonce each time', async ({ request }) => {
  const first = await request.get('/login');
  const second = await request.get('/login');
  const h = first.headers();
  const csp = h['content-security-policy'];
  expect(csp).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]{20,}' 'strict-dynamic'/);
  expect(csp).toContain("frame-ancestors 'none'");
  expect(csp).toContain("object-src 'none'");
  expect(csp).not.toContain('unsafe-eval'); // `next start` is production
  expect(h['x-content-type-options']).toBe('nosniff');
  expect(h['referrer-policy']).toBe('same-origin');
  expect(h['permissions-policy']).toContain('camera=(self)');
  expect(h['strict-transport-security']).toMatch(/max-age=\d{7,}/);
  const nonce = /'nonce-([^']+)'/.exec(csp)![1];
  expect(/'nonce-([^']+)'/.exec(second.headers()['content-security-policy'])![1]).not.toBe(nonce);
  // the framework's own script tags carry this answer's nonce
  expect(await first.text()).toContain(`nonce="${nonce}"`);

  // API answers and redirects too
  const api = await request.get('/api/health');
  expect(api.headers()['x-content-type-options']).toBe('nosniff');
  expect(api.headers()['content-security-policy']).toContain("frame-ancestors 'none'");
  const redirect = await request.get('/desk', { maxRedirects: 0 });
  expect(redirect.status()).toBe(307);
  expect(redirect.headers()['content-security-policy']).toBeTruthy();
});

test('a form post the framework cannot read is the sender’s fault: 400 with headers, never 500', async ({
  request,
}) => {
  // A multipart body that never uses the boundary its Content-Type announces (RFC 7578 §4.1: each
  // part starts with "--" + boundary), and one whose Content-Type has no boundary at all.
  const cases = [
    { type: 'multipart/form-data; boundary=----hm-never-used', body: 'no parts here at all' },
    { type: 'multipart/form-data', body: '--x\r\nContent-Disposition: form-data; name="a"\r\n\r\n1' },
  ];
  for (const path of ['/login', '/gate', '/no-such-page']) {
    for (const c of cases) {
      const r = await request.post(path, {
        headers: { 'content-type': c.type },
        data: c.body,
        maxRedirects: 0,
      });
      expect(r.status(), `${path} with ${c.type}`).toBe(400);
      expect(await r.json()).toMatchObject({ code: 'invalid' });
      expect(r.headers()['x-content-type-options']).toBe('nosniff');
    }
  }
  // a well-formed form post to a page is not refused by this check
  const fine = await request.post('/login', { form: { a: '1' }, maxRedirects: 0 });
  expect(fine.status()).not.toBe(400);
  expect(fine.status()).toBeLessThan(500);
});

test('signing in and scanning at the gate with the camera raise no CSP violation', async () => {
  test.slow(); // launches its own browser with a fake camera
  const camera = await launchWithCamera(await writeLabelVideo('SLOT B07', '.data/e2e-csp-scan.y4m'));
  try {
    const page = camera.page;
    const violations = await watchViolations(page);
    await new SignInPage(page).signIn('driver');
    await expect(page).toHaveURL(new RegExp(`${ACCOUNTS.driver.home}$`));
    // the font loaded from this site
    await page.evaluate(() => document.fonts.ready);
    expect(await page.evaluate(() => [...document.fonts].some((f) => f.status === 'loaded'))).toBe(true);
    await page.getByRole('button', { name: 'Scan trailer label' }).click();
    await expect(page.getByText('Read: SLOT B07')).toBeVisible({ timeout: 30_000 });
    expect(violations).toEqual([]);

    // the watch itself works, and the policy bites: a picture from another site is blocked and reported
    await page.evaluate(() => {
      const img = document.createElement('img');
      img.src = 'http://elsewhere.example/pixel.png';
      document.body.append(img);
    });
    await expect
      .poll(() => violations.join('\n'))
      .toContain('img-src blocked http://elsewhere.example/pixel.png');
  } finally {
    await camera.browser.close();
  }
});
