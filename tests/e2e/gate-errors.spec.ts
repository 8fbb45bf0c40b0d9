import { expect, test } from '@playwright/test';
import { HandoffFormPage } from './pages/handoff-form-page';
import { LabelPage } from './pages/label-page';
import { ACCOUNTS, SignInPage } from './pages/sign-in-page';

// R53201: a seeded reefer on the road with an ok history (db/seed/history.ts: every fifth trailer).
// Nothing is recorded here: every send is refused by the form's own check before it leaves.
const UNIT = 'R53201';

test('engine hours -5 and an over-long note: each message under its field, focus on the first', async ({
  page,
}) => {
  await new SignInPage(page).signIn('driver');
  await expect(page).toHaveURL(new RegExp(`${ACCOUNTS.driver.home}$`));
  const trailerId = await new LabelPage(page).trailerId(UNIT);
  await page.goto(`/gate/trailers/${trailerId}`);
  const form = new HandoffFormPage(page);

  await form.fillHeader({ tractor: 'T-7702', loaded: false });
  await form.fillReefer({ fuel: 'Full 8/8', setpoint: '34', returnAir: '36', engineHours: '-5' });
  // the browser's limits are the schema's (lib/handoffs/limits.ts)
  await form.openStep('Reefer readings');
  const hours = page.getByLabel('Engine hours');
  await expect(hours).toHaveAttribute('min', '0');
  await expect(hours).toHaveAttribute('max', '200000');
  await expect(page.getByLabel('Setpoint °F')).toHaveAttribute('min', '-40');

  await form.openStep('Confirm');
  const note = page.getByLabel('Note for the record (optional)');
  await expect(note).toHaveAttribute('maxlength', '1000');
  // a note longer than the limit can still arrive (a draft saved by an older form): lift the
  // browser's limit the way such a draft would bypass it, and the schema's message must show
  await note.evaluate((el) => el.removeAttribute('maxlength'));
  await note.fill('x'.repeat(1001));
  await form.submit('drop');

  // the reefer step, before the confirmation, opens and takes the focus
  await expect(form.stepHeading('Reefer readings')).toBeVisible();
  await expect(hours).toBeFocused();
  await expect(hours).toHaveAttribute('aria-invalid', 'true');
  await expect(page.locator('#engineHours-error')).toHaveText('Engine hours cannot be negative.');

  // fixed: the next send stops at the note, under the note
  await hours.fill('9100');
  await form.submit('drop');
  await expect(note).toBeFocused();
  await expect(note).toHaveAttribute('aria-invalid', 'true');
  await expect(page.locator('#note-error')).toHaveText('The note is at most 1000 characters.');
  await expect(page).toHaveURL(new RegExp(`/gate/trailers/${trailerId}$`));
});
