import { expect, type Page } from '@playwright/test';

/** The desk's case page: evidence pairs, the command forms, the history. */
export class DeskCasePage {
  constructor(private readonly page: Page) {}

  async openFromQueue(unitNumber: string) {
    await this.page.goto('/desk?sort=newest');
    await this.page
      .getByRole('list', { name: 'Cases' })
      .getByRole('link', { name: new RegExp(`Trailer ${unitNumber}`) })
      .click();
    await expect(
      this.page.getByRole('heading', { level: 1, name: new RegExp(`Trailer ${unitNumber}`) }),
    ).toBeVisible();
  }

  evidence(itemLabel: string) {
    return this.page.getByRole('article', { name: itemLabel });
  }

  /** True when the image has really loaded (not the placeholder, not a broken image). */
  async photoLoaded(name: RegExp) {
    const img = this.page.getByRole('img', { name });
    await expect(img).toBeVisible();
    await expect
      .poll(() =>
        img.evaluate((el) => (el as HTMLImageElement).complete && (el as HTMLImageElement).naturalWidth > 0),
      )
      .toBe(true);
    return img;
  }

  /** Sends one command form and waits until the case shows the state it leads to. */
  async submit(form: string, button: string, nextState: string) {
    await this.page.getByRole('form', { name: form }).getByRole('button', { name: button }).click();
    await expect(this.page.getByRole('heading', { level: 1 })).toContainText(nextState, { timeout: 15_000 });
  }

  form(name: string) {
    return this.page.getByRole('form', { name });
  }
}
