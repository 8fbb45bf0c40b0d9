import { expect, type Page } from '@playwright/test';
import { baseURL } from '../../../playwright.config';

export const ACCOUNTS = {
  admin: { kind: 'staff', id: 'admin@bramblecrest.example', secret: 'hitchmark-admin', home: '/desk' },
  clerk: { kind: 'staff', id: 'clerk@bramblecrest.example', secret: 'hitchmark-clerk', home: '/desk' },
  jockey: { kind: 'staff', id: 'jockey@bramblecrest.example', secret: 'hitchmark-jockey', home: '/yard' },
  driver: { kind: 'driver', id: 'D1001', secret: '4321', home: '/gate' },
  outsideDriver: { kind: 'driver', id: 'D2001', secret: '2468', home: '/gate' },
} as const;
export type AccountName = keyof typeof ACCOUNTS;

export class SignInPage {
  constructor(private readonly page: Page) {}

  async open(next?: string) {
    await this.page.goto(next ? `/login?next=${encodeURIComponent(next)}` : '/login');
  }

  async signIn(name: AccountName, secret?: string) {
    const account = ACCOUNTS[name];
    // the account remembers the language chosen at sign-in: a phone that has not chosen one signs
    // in in English, so a language another spec chose for this account does not carry over
    const context = this.page.context();
    if (!(await context.cookies(baseURL)).some((c) => c.name === 'hm-locale'))
      await context.addCookies([{ name: 'hm-locale', value: 'en', url: baseURL }]);
    await this.open();
    await this.fill(account.kind, account.id, secret ?? account.secret);
  }

  async fill(kind: 'staff' | 'driver', id: string, secret: string) {
    if (kind === 'staff') {
      await this.page.getByRole('tab', { name: 'Terminal staff' }).click();
      await this.page.getByLabel('E-mail').fill(id);
      await this.page.getByLabel('Password').fill(secret);
    } else {
      await this.page.getByRole('tab', { name: 'Driver' }).click();
      await this.page.getByLabel('Driver number').fill(id);
      await this.page.getByLabel('PIN').fill(secret);
    }
    await this.page.getByRole('button', { name: 'Sign in' }).click();
  }

  async signOut() {
    await this.page.getByRole('button', { name: 'Sign out' }).click();
    await expect(this.page).toHaveURL(/\/login$/);
  }
}
