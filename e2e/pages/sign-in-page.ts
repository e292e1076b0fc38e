import type { Page } from '@playwright/test';

export class SignInPage {
  constructor(private readonly page: Page) {}

  async open(callbackUrl?: string): Promise<void> {
    await this.page.goto(callbackUrl ? `/sign-in?callbackUrl=${encodeURIComponent(callbackUrl)}` : '/sign-in');
  }

  async signIn(email: string, password: string): Promise<void> {
    await this.page.getByTestId('signin-email').fill(email);
    await this.page.getByTestId('signin-password').fill(password);
    await this.page.getByTestId('signin-submit').click();
  }

  errorMessage() {
    return this.page.getByTestId('signin-error');
  }
}
