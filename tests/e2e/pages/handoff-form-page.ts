import { expect, type Locator, type Page } from '@playwright/test';

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** The gate handoff form (/gate/trailers/[id]) as a driver fills it, step by step. */
export class HandoffFormPage {
  constructor(private readonly page: Page) {}

  /** The open step's heading ("3. Safety checks"). */
  stepHeading(title: string): Locator {
    return this.page.getByRole('heading', { name: new RegExp(`^\\d\\. ${escape(title)}$`) });
  }

  /** Opens a step unless it is open (a folded step is one button: "3. Safety checks: …"). */
  async openStep(title: string) {
    const heading = this.stepHeading(title);
    const folded = this.page.getByRole('button', { name: new RegExp(`^\\d\\. ${escape(title)}:`) });
    // the draft is read from the phone first: wait for the step to show, open or folded
    await expect(heading.or(folded)).toBeVisible();
    if (await heading.isVisible()) return;
    await folded.click();
    await expect(this.stepHeading(title)).toBeVisible();
  }

  /** Unfolds the items of a zone of the rest of the box, or of a safety group. */
  async showItems(name: string) {
    const toggle = this.page.getByRole('button', {
      name: new RegExp(
        `^(Check each item of ${escape(name.toLowerCase())}|Change one item: ${escape(name)})$`,
      ),
    });
    if (await toggle.isVisible()) await toggle.click();
  }

  item(label: string): Locator {
    return this.page.locator(`li[aria-label="${label}"]`);
  }

  async choose(group: string, option: string, within: Locator | Page = this.page) {
    await within
      .getByRole('group', { name: group })
      .getByRole('button', { name: option, exact: true })
      .click();
  }

  async fillHeader({ tractor, loaded }: { tractor: string; loaded: boolean }) {
    await this.openStep('Who and what');
    await this.page.getByLabel('Tractor number').fill(tractor);
    await this.choose('Loaded or empty?', loaded ? 'Loaded' : 'Empty');
  }

  async fillReefer({
    fuel,
    setpoint,
    returnAir,
    engineHours,
  }: {
    fuel: string;
    setpoint: string;
    returnAir: string;
    engineHours: string;
  }) {
    await this.openStep('Fuel');
    await this.choose('Fuel in eighths', fuel);
    await this.openStep('Reefer readings');
    await this.choose('Unit running?', 'Running');
    await this.page.getByLabel('Setpoint °F').fill(setpoint);
    await this.page.getByLabel('Return air °F').fill(returnAir);
    await this.page.getByLabel('Engine hours').fill(engineHours);
    // an hour ago, in the browser's own time zone (datetime-local has none)
    const when = await this.page.evaluate(() => {
      const d = new Date(Date.now() - 3_600_000);
      const p = (n: number) => String(n).padStart(2, '0');
      return `${d.getFullYear()}-${p(d.getMonth() + 1)}-${p(d.getDate())}T${p(d.getHours())}:${p(d.getMinutes())}`;
    });
    await this.page.getByLabel('When was the last pre-trip run?').fill(when);
    await this.choose('Last pre-trip', 'Passed');
  }

  /** One tap: every item with an earlier record takes its last condition, safety items excepted. */
  async sameAsLastEverywhere() {
    await this.openStep('The rest of the box');
    await this.page
      .getByRole('button', { name: 'Same as last for every zone (safety items excluded)' })
      .click();
  }

  /** The explicit statement of each safety group ("… I looked at each"), tires with the tread given. */
  async answerSafety(treadThirtySeconds: number) {
    await this.openStep('Safety checks');
    await this.page
      .getByLabel('Shallowest tread you measured (32nds of an inch)')
      .fill(String(treadThirtySeconds));
    const statements = this.page.getByRole('button', { name: /: I looked/ });
    const n = await statements.count();
    expect(n).toBeGreaterThanOrEqual(5);
    for (let i = 0; i < n; i++) await statements.nth(i).click();
    return n;
  }

  async submit(kind: 'drop' | 'hook') {
    await this.openStep('Confirm');
    await this.page.getByRole('button', { name: `Record the ${kind}` }).click();
  }
}
