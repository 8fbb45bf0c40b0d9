import { expect, test, type Page } from '@playwright/test';
import { HandoffFormPage } from './pages/handoff-form-page';
import { ACCOUNTS } from './pages/sign-in-page';
import { englishDateWords, englishFragments, expectNoEnglishOn, say } from './support/catalogue-leaks';
import { reeferOnTheRoad } from './support/road-trailer';

// Issue 13: a driver who picks Español at sign-in drops a reefer and hooks it again, unchanged,
// through every step of the gate form to the receipt, and no step shows an English message of the
// namespaces the gate, the form and the receipt use (the leak check of spanish-pages.spec.ts).
const NAMESPACES = ['Shell', 'Gate', 'Handoff', 'Checklist', 'Cautions', 'Common', 'Offline', 'Reasons'];
// the catalogues' English, and English month and weekday names (a "Last:" time written in English)
const FRAGMENTS = [...englishFragments(NAMESPACES), ...englishDateWords()];
const t = say('es', 'Handoff');

/** Unfolds every folded part of the open step (safety groups, zones), so each item row is read too. */
async function unfoldAll(page: Page, step: string) {
  const folded = page.locator(`section[data-step="${step}"] button[aria-expanded="false"]`);
  while ((await folded.count()) > 0) await folded.first().click();
}

async function handoff(page: Page, trailer: { id: string; unit: string }, kind: 'drop' | 'hook') {
  const form = new HandoffFormPage(page, 'es');
  const noEnglish = (where: string) => expectNoEnglishOn(page, FRAGMENTS, `${kind}: ${where}`);
  await page.goto(`/gate/trailers/${trailer.id}?kind=${kind}`);
  await expect(page.getByRole('heading', { level: 1 })).toHaveText(
    t('trailer.title', { kind, unit: trailer.unit }),
  );

  await form.openStep('who');
  const tractor = page.getByLabel(t('who.tractor'));
  if ((await tractor.inputValue()) === '') await tractor.fill('T-4411');
  await form.choose(t('who.loadedQuestion'), t('who.empty'));
  await noEnglish(t('steps.who'));

  await form.fillReefer({ fuel: t('fuel.full'), setpoint: '34', returnAir: '36', engineHours: '9100' });
  await form.openStep('fuel');
  await noEnglish(t('steps.fuel'));
  await form.openStep('reefer');
  await noEnglish(t('steps.reefer'));

  // the statements in Spanish words: pins, spare, fuel leak, landing gear, tires, rear doors
  await form.openStep('safety');
  await expect(page.getByRole('button', { name: /^Los cuatro pernos del tándem/ })).toBeVisible();
  await noEnglish(t('steps.safety'));
  expect(await form.answerSafety(9)).toBe(6);
  // the last statement moves on to the next step: back to read each item row of the safety checks
  await form.openStep('safety');
  await unfoldAll(page, 'safety');
  await expect(form.item('Perno del tándem, izquierdo trasero')).toBeVisible();
  await noEnglish(t('steps.safety'));

  await form.sameAsLastEverywhere();
  // that tap also moves on: back to read every zone and item row
  await form.openStep('rest');
  await unfoldAll(page, 'rest');
  await expect(page.getByRole('heading', { name: 'Parte trasera', level: 3 })).toBeVisible();
  await noEnglish(t('steps.rest'));

  await form.openStep('confirm');
  await noEnglish(t('steps.confirm'));
  await form.submit(kind);
  await expect(page).toHaveURL(/\/gate\/receipts\/[0-9a-f-]{36}$/, { timeout: 30_000 });
  await expect(page.getByRole('heading', { level: 1 })).toContainText(trailer.unit);
  await noEnglish('receipt');
}

test('a driver who reads Spanish drops and hooks an unchanged reefer, in Spanish to the receipt', async ({
  page,
}) => {
  // two handoffs, each step read whole, on a shared 2-core machine
  test.setTimeout(300_000);
  expect(FRAGMENTS).toContain('Safety item: answer from what you see now');
  expect(FRAGMENTS).toContain('Tandem locking pins');
  const trailer = await reeferOnTheRoad();

  // the driver picks Español on the sign-in page and signs in with its Spanish words
  await page.goto('/login');
  await page.getByRole('button', { name: 'Español' }).click();
  await expect(page.locator('html')).toHaveAttribute('lang', 'es');
  const login = say('es', 'Login');
  await page.getByRole('tab', { name: login('driver') }).click();
  await page.getByLabel(login('driverNumber')).fill(ACCOUNTS.driver.id);
  await page.getByLabel(login('pin')).fill(ACCOUNTS.driver.secret);
  await page.getByRole('button', { name: login('submit'), exact: true }).click();
  await expect(page).toHaveURL(/\/gate$/);
  await expectNoEnglishOn(page, FRAGMENTS, '/gate');

  await handoff(page, trailer, 'drop');
  await handoff(page, trailer, 'hook');
});
