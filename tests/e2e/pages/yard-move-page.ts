import type { Page } from '@playwright/test';

export class YardMovePage {
  constructor(private readonly page: Page) {}

  async open() {
    await this.page.goto('/yard/moves');
  }

  unit() {
    return this.page.getByLabel('Unit', { exact: true });
  }

  target() {
    return this.page.getByLabel('To slot or door');
  }

  async move(unit: string, target: string) {
    await this.unit().fill(unit);
    await this.target().fill(target);
    await this.page.getByRole('button', { name: 'Record move' }).click();
  }
}
