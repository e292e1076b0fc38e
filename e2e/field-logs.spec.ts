import { expect, test } from '@playwright/test';
import { SignInPage } from './pages/sign-in-page';
import { circuitIdByTitle, DEMO_PASSWORD, demoUser } from './support/demo';

const DEMO_LOG = 'demo/logs/lid-press-slow-close.csv';

test('a technician uploads a log of the slow lid press, maps it, replays it, sees where it diverges and which fault explains it', async ({ page }) => {
  test.setTimeout(240_000);
  const signIn = new SignInPage(page);
  await signIn.open('/circuits');
  await signIn.signIn(demoUser('technician').email, DEMO_PASSWORD);
  await expect(page.getByTestId('circuit-table')).toBeVisible();
  const circuitId = await circuitIdByTitle(page, 'Lid press — relay control, 24 V DC');
  await page.goto(`/circuits/${circuitId}`);
  await page.getByTestId('logs-link').click();
  await expect(page.getByTestId('logs-page')).toBeVisible();

  // A file that is not a log is refused before it is sent.
  await page.getByTestId('log-file').setInputFiles({ name: 'notes.pdf', mimeType: 'application/pdf', buffer: Buffer.from('%PDF-1.4') });
  await expect(page.getByTestId('log-upload-error')).toContainText('must end in');

  // The demo log goes up and opens on its columns, pre-filled from their names.
  const rowsBefore = await page.getByTestId('logs-row').count();
  await page.getByTestId('log-file').setInputFiles(DEMO_LOG);
  await expect(page.getByTestId('logs-row')).toHaveCount(rowsBefore + 1);
  await expect(page.getByTestId('log-detail')).toBeVisible();
  await expect(page.getByTestId('mapping-form')).toBeVisible();
  const row = (column: string) => page.locator(`[data-testid="mapping-row"][data-column="${column}"]`);
  await expect(row('S1_start').getByTestId('mapping-role')).toHaveValue('command');
  await expect(row('1B2_down').getByTestId('mapping-tag')).toHaveValue('1B2');
  await expect(row('1B2_down').getByTestId('mapping-role')).toHaveValue('observation');
  // The cap-side pressure was logged in bar gauge.
  await row('p_cap_bar').getByTestId('mapping-tag').selectOption('1A1');
  await row('p_cap_bar').getByTestId('mapping-word').selectOption('pressure:A');
  await row('p_cap_bar').getByTestId('mapping-role').selectOption('observation');
  await row('p_cap_bar').getByTestId('mapping-unit').selectOption('bar-gauge');
  await page.getByTestId('mapping-save').click();

  // The replay: the model, healthy, closes sooner than the machine did.
  await expect(page.getByTestId('replay-view')).toBeVisible();
  await page.getByTestId('replay-start').click();
  await expect(page.getByTestId('replay-divergence')).toBeVisible({ timeout: 60_000 });
  await expect(page.getByTestId('replay-divergence')).toContainText('First divergence');
  await expect(page.getByTestId('edge-divergence')).toBeVisible();
  await expect(page.locator('[data-testid="edge-lane"][data-signal="1B2 on"]')).toBeVisible();

  // The fault search ranks the flow control closed too far first.
  await page.getByTestId('log-tab-faults').click();
  await page.getByTestId('fault-search-start').click();
  await expect(page.getByTestId('fault-search-status')).toHaveText('finished', { timeout: 180_000 });
  const first = page.getByTestId('fault-candidate').first();
  await expect(first).toContainText('1V2');
  await expect(page.getByTestId('fault-ranking')).toBeVisible();
});
