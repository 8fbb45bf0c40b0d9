import { expect, type Locator, type Page } from '@playwright/test';

/** The gate handoff form (/gate/trailers/[id]) as a driver fills it. */
export class HandoffFormPage {
  constructor(private readonly page: Page) {}

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
    await this.choose('Fuel in eighths', fuel);
    await this.choose('Unit running?', 'Running');
    await this.page.getByLabel('Setpoint °F').fill(setpoint);
    await this.page.getByLabel('Return air °F').fill(returnAir);
    await this.page.getByLabel('Engine hours').fill(engineHours);
    await this.choose('Last pre-trip', 'Passed');
    // an hour ago, in the browser's own time zone (datetime-local has none)
    const when = await this.page.evaluate(() => {
      const d = new Date(Date.now() - 3_600_000);
      const p = (n: number) => String(n).padStart(2, '0');
      return `${d.getFullYear()}-${p(d.getMonth() + 1)}-${p(d.getDate())}T${p(d.getHours())}:${p(d.getMinutes())}`;
    });
    await this.page.getByLabel('When was it run?').fill(when);
  }

  /** One tap: every item with an earlier record takes its last condition, safety items excepted. */
  async sameAsLastEverywhere() {
    await this.page
      .getByRole('button', { name: 'Same as last for every zone (safety items excluded)' })
      .click();
  }

  /** The explicit statement of each safety group ("… I looked at each"), tires with the tread given. */
  async answerSafety(treadThirtySeconds: number) {
    await this.page
      .getByLabel('Shallowest tread you measured (32nds of an inch)')
      .fill(String(treadThirtySeconds));
    const statements = this.page.getByRole('button', { name: /: I looked at/ });
    const n = await statements.count();
    expect(n).toBeGreaterThanOrEqual(5);
    for (let i = 0; i < n; i++) await statements.nth(i).click();
    return n;
  }

  async submit(kind: 'drop' | 'hook') {
    await this.page.getByRole('button', { name: `Record the ${kind}` }).click();
  }
}
