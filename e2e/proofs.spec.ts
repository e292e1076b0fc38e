import { expect, test } from '@playwright/test';
import { SignInPage } from './pages/sign-in-page';
import { copyOfDemo, DEMO_PASSWORD, demoUser } from './support/demo';

/** The ISO 13851 synchronous-start rule, written for the demo two-hand press. */
const TWO_HAND_RULE = ['rule "1A1 moves out only on a two-hand start":', '  1A1 is extending only after together within 0.5 s (1S1 is pressed, 1S2 is pressed) within 0.3 s'].join('\n');

test('an engineer writes a two-hand rule, the timing search breaks it, and the counterexample replays with the press moving out', async ({ page }) => {
  test.setTimeout(180_000);
  const signIn = new SignInPage(page);
  await signIn.open('/circuits');
  await signIn.signIn(demoUser('engineer').email, DEMO_PASSWORD);
  await expect(page.getByTestId('circuit-table')).toBeVisible();
  // The press built with only a two-pressure valve: it does not check how far apart the hands came.
  const circuitId = await copyOfDemo(page, 'lid-press-two-hand', `Lid press proof ${Date.now()}`);
  await page.goto(`/circuits/${circuitId}`);
  await page.getByTestId('proofs-link').click();
  await expect(page.getByTestId('proofs-page')).toBeVisible();

  // Writing the rule: a misspelt state word is reported at its line and column before saving.
  const editor = page.getByTestId('rules-editor');
  await editor.fill(TWO_HAND_RULE.replace('is extending', 'is extendin'));
  await expect(page.getByTestId('rules-editor-errors')).toContainText('line 2, column');
  await expect(page.getByTestId('rules-save')).toBeDisabled();
  await editor.fill(TWO_HAND_RULE);
  await expect(page.getByTestId('rules-editor-errors')).toHaveCount(0);
  await page.getByTestId('rules-save').click();
  await expect(page.getByTestId('rules-status')).toContainText('saved (save 1)');

  // The search: both buttons vary, half-second steps to a depth of five.
  await page.getByTestId('proofs-tab-search').click();
  await expect(page.getByTestId('vary-1S1-button')).toBeChecked();
  await expect(page.getByTestId('vary-1S2-button')).toBeChecked();
  await page.getByTestId('search-quantum').fill('0.5');
  await page.getByTestId('search-steps').fill('5');
  await page.getByTestId('search-start').click();
  await expect(page.getByTestId('proof-status')).toHaveText('finished', { timeout: 120_000 });
  await expect(page.getByTestId('proof-coverage')).toContainText('input sequences simulated');
  const verdict = page.getByTestId('proof-rule').filter({ hasText: '1A1 moves out only on a two-hand start' });
  await expect(verdict.getByTestId('proof-rule-verdict')).toHaveText('broken');

  // The counterexample: one hand, then the other more than half a second later.
  await verdict.getByTestId('proof-replay').click();
  await expect(page.getByTestId('run-replay')).toBeVisible();
  const broken = page.getByTestId('replay-broken-rule');
  await expect(broken).toContainText('1A1 moves out only on a two-hand start');
  // The replay opens at the broken moment, the rule marked there, and the press on its way out.
  await expect(broken).toHaveAttribute('data-at-break', 'true');
  await expect(page.getByTestId('replay-moment')).toContainText(/1A1\s+position [\d.]+ mm, moving out/);
  const moment = Number((await page.getByTestId('replay-time').textContent())!.match(/t = ([\d.]+) s/)![1]);
  expect(moment).toBeGreaterThan(0.5);
  // Before the second hand came, the press stood still.
  await page.getByTestId('replay-slider').fill('0.3');
  await expect(page.getByTestId('replay-broken-rule')).not.toHaveAttribute('data-at-break', 'true');
  await expect(page.getByTestId('replay-moment')).toContainText(/1A1\s+position 0\.0 mm, still/);
  await expect(page.getByTestId('step-diagram')).toBeVisible();

  // The printable report names the broken rule and carries the caution.
  await page.getByTestId('proofs-tab-search').click();
  await page.getByTestId('proof-report-link').click();
  await expect(page.getByTestId('proof-report')).toBeVisible();
  await expect(page.getByTestId('report-results')).toContainText('broken');
  await expect(page.getByTestId('report-counterexample')).toContainText('1S');
  await expect(page.getByTestId('report-caution')).toContainText('never replaces');
  // The counterexample's sequence, as observed, goes into the report too.
  await expect(page.getByTestId('report-counterexample').getByTestId('step-diagram')).toBeVisible();
  await expect(page.getByTestId('report-counterexample').getByTestId('step-list-row').first()).toBeVisible();
});
