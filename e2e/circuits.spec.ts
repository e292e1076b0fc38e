import { expect, test } from '@playwright/test';
import { CircuitsPage } from './pages/circuits-page';
import { SignInPage } from './pages/sign-in-page';
import { DEMO_CIRCUITS, DEMO_PASSWORD, demoUser } from './support/demo';

test('the demo engineer signs in and sees the demo circuits', async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open('/circuits');
  await signIn.signIn(demoUser('engineer').email, DEMO_PASSWORD);

  const circuits = new CircuitsPage(page);
  await expect(page).toHaveURL(/\/circuits$/);
  await expect(circuits.table()).toBeVisible();
  for (const demo of DEMO_CIRCUITS) {
    await expect(circuits.table().getByText(demo.title, { exact: true })).toBeVisible();
  }
  await expect(circuits.rows()).toHaveCount(DEMO_CIRCUITS.length);
  await page.screenshot({ path: 'test-results/screens/circuits-1440.png', fullPage: true });

  // Sorting by title puts the titles in alphabetical order.
  await circuits.sortBy('Title').click();
  const sorted = [...DEMO_CIRCUITS.map((c) => c.title)].sort((a, b) => a.localeCompare(b));
  await expect(circuits.rows().first()).toContainText(sorted[0]!);

  await page.setViewportSize({ width: 390, height: 844 });
  await expect(circuits.table()).toBeVisible();
  await page.screenshot({ path: 'test-results/screens/circuits-390.png', fullPage: true });
});

test('a wrong password shows an error and stays on the sign-in page', async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(demoUser('viewer').email, 'not-the-password');
  await expect(signIn.errorMessage()).toBeVisible();
  await expect(page).toHaveURL(/\/sign-in/);
});

test('the circuits page sends a signed-out visitor to sign in', async ({ page }) => {
  await page.goto('/circuits');
  await expect(page).toHaveURL(/\/sign-in/);
});

test('the landing page and health check answer', async ({ page, request }) => {
  await page.goto('/');
  await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
  await page.screenshot({ path: 'test-results/screens/landing-1440.png', fullPage: true });
  const health = await request.get('/api/health');
  expect(health.status()).toBe(200);
  expect(await health.json()).toMatchObject({ status: 'ok', database: { ok: true } });
});
