import { expect, type Page } from '@playwright/test';

/** A trailer's label page (/trailers/[id]/label) and the lookup API, as a clerk uses them. */
export class LabelPage {
  constructor(private readonly page: Page) {}

  async trailerId(unit: string): Promise<string> {
    const response = await this.page.request.get(`/api/trailers/lookup?unit=${encodeURIComponent(unit)}`);
    expect(response.status()).toBe(200);
    return (await response.json()).trailer.id;
  }

  async open(trailerId: string) {
    await this.page.goto(`/trailers/${trailerId}/label`);
  }

  /** The link the printed QR encodes, as the app rendered it on the label. */
  async link(): Promise<string> {
    const link = await this.page.locator('figure[data-label-link]').first().getAttribute('data-label-link');
    expect(link).toMatch(/\/l\/[A-Za-z0-9_-]+$/);
    return link!;
  }

  async reissue() {
    await this.page.getByRole('button', { name: 'Re-issue label' }).click();
    await expect(this.page.getByText('New label issued.')).toBeVisible();
  }
}
