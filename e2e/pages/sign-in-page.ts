import { expect, type Page } from '@playwright/test';

export const DEMO_PASSWORD = 'wiretrail-demo';

export class SignInPage {
  constructor(private readonly page: Page) {}

  async goto(): Promise<void> {
    await this.page.goto('/sign-in');
    await expect(this.page.getByRole('form', { name: 'Sign in' })).toBeVisible();
  }

  async signIn(email: string, password = DEMO_PASSWORD): Promise<void> {
    await this.page.getByLabel('E-mail').fill(email);
    await this.page.getByLabel('Password').fill(password);
    await this.page.getByRole('button', { name: 'Sign in' }).click();
  }

  /** For someone who works for several organisations: the choice shown once the password is right. */
  async chooseOrganisation(name: string): Promise<void> {
    const choice = this.page.getByRole('group', { name: /more than one organisation/ });
    await expect(choice).toBeVisible();
    await choice.getByRole('button', { name }).click();
  }
}
