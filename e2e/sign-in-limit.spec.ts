import { expect, test } from '@playwright/test';
import { SignInPage } from './pages/sign-in-page';
import { uniqueEmail } from './support/mailbox';

test('after five wrong passwords the sign-in form says to wait, even for the right one', async ({ page }) => {
  const email = uniqueEmail('locked');
  const created = await page.request.post('/api/account/sign-up', { data: { name: 'Ilse Varga', email, password: 'right-password-4471' } });
  expect(created.status()).toBe(201);

  const signIn = new SignInPage(page);
  await signIn.open();
  for (let attempt = 1; attempt <= 5; attempt += 1) {
    await signIn.signIn(email, `wrong-password-${attempt}`);
    await expect(signIn.errorMessage()).toBeVisible();
    await expect(signIn.errorMessage()).not.toContainText(/too many/i);
  }
  await signIn.signIn(email, 'right-password-4471');
  await expect(signIn.errorMessage()).toContainText(/Too many sign-in attempts/);
  await expect(page).toHaveURL(/\/sign-in/);
});
