import { expect, test } from '@playwright/test';
import { SignInPage } from './pages/sign-in-page';
import { linkIn, uniqueEmail, waitForMail } from './support/mailbox';

test('a forgotten password is reset through the e-mailed link', async ({ page }) => {
  const email = uniqueEmail('forgetful');
  const created = await page.request.post('/api/account/sign-up', { data: { name: 'Odile Brandt', email, password: 'first-password-881' } });
  expect(created.status()).toBe(201);

  await page.goto('/sign-in');
  await page.getByRole('link', { name: /forgotten your password/i }).click();
  await expect(page).toHaveURL(/\/forgot-password/);
  await page.getByTestId('forgot-email').fill(email);
  await page.getByTestId('forgot-submit').click();
  await expect(page.getByTestId('form-success')).toBeVisible();

  const link = linkIn(await waitForMail(email, /reset/i), '/reset-password');
  await page.goto(link);
  await page.getByTestId('reset-password').fill('second-password-882');
  await page.getByTestId('reset-password-confirm').fill('second-password-882');
  await page.getByTestId('reset-submit').click();
  await expect(page.getByTestId('reset-done')).toBeVisible();

  // The link works once.
  await page.goto(link);
  await page.getByTestId('reset-password').fill('third-password-883');
  await page.getByTestId('reset-password-confirm').fill('third-password-883');
  await page.getByTestId('reset-submit').click();
  await expect(page.getByTestId('field-error-token').or(page.getByTestId('form-error'))).toBeVisible();

  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(email, 'first-password-881');
  await expect(signIn.errorMessage()).toBeVisible();
  await signIn.signIn(email, 'second-password-882');
  await expect(page).not.toHaveURL(/\/sign-in/);
});
