import { expect, test } from '@playwright/test';
import { SignInPage } from './pages/sign-in-page';
import { DEMO_PASSWORD, demoUser } from './support/demo';

// next-auth's own routes (GET and POST /api/auth/[...nextauth]) need Next's request
// scope, so the role-permission table checks them here against the running server.
test('next-auth endpoints answer signed out and signed in', async ({ page }) => {
  const signedOut = await page.request.get('/api/auth/session');
  expect(signedOut.status()).toBe(200);
  expect(await signedOut.json()).toEqual({});

  const csrf = await page.request.get('/api/auth/csrf');
  expect(csrf.status()).toBe(200);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };

  // A credentials post without the CSRF token is turned away, not processed.
  const forged = await page.request.post('/api/auth/callback/credentials', {
    form: { email: demoUser('owner').email, password: DEMO_PASSWORD },
    maxRedirects: 0,
  });
  expect(forged.status()).toBe(302);
  expect(forged.headers().location).toContain('csrf=true');
  expect(csrfToken.length).toBeGreaterThan(10);

  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(demoUser('reviewer').email, DEMO_PASSWORD);
  await expect(page).toHaveURL(/\/circuits/);
  const signedIn = await page.request.get('/api/auth/session');
  expect(signedIn.status()).toBe(200);
  expect(await signedIn.json()).toMatchObject({ user: { email: demoUser('reviewer').email } });

  await page.goto('/sign-out');
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/\/$/);
  expect(await (await page.request.get('/api/auth/session')).json()).toEqual({});
});
