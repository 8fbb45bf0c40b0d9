import { expect, type Page } from '@playwright/test';

export class YardWalkPage {
  constructor(private readonly page: Page) {}

  async start(rowName: string) {
    await this.page.goto('/yard/walks');
    await this.page.getByRole('checkbox', { name: rowName }).check();
    await this.page.getByRole('button', { name: 'Start walk' }).click();
    await expect(this.page).toHaveURL(/\/yard\/walks\/[0-9a-f-]{36}$/);
  }

  /** Types the unit, checks the suggested slot is the expected one (or picks it), records the scan. */
  async scan(
    unit: string,
    slotLabel: string,
    { fuelEighths, keepUnit = false }: { fuelEighths?: number; keepUnit?: boolean } = {},
  ) {
    if (!keepUnit) await this.page.getByLabel('Unit', { exact: true }).fill(unit);
    await this.page.getByLabel('Slot', { exact: true }).selectOption({ label: slotLabel });
    if (fuelEighths !== undefined)
      await this.page.getByLabel('Fuel (eighths)').selectOption(String(fuelEighths));
    await this.page.getByRole('button', { name: 'Record scan' }).click();
  }

  scans() {
    return this.page.getByRole('list', { name: 'Scans of this walk' }).getByRole('listitem');
  }

  async finish() {
    await this.page.getByRole('button', { name: 'Finish walk' }).click();
    await expect(this.page.getByRole('heading', { name: 'Reconciliation' })).toBeVisible();
  }

  count(key: 'matched' | 'wrong_slot' | 'missing' | 'unknown' | 'duplicate') {
    return this.page.getByTestId(`count-${key}`);
  }
}
