import { expect, test, type Page } from '@playwright/test';
import { EditorPage } from './pages/editor-page';
import { SignInPage } from './pages/sign-in-page';
import { copyOfDemo, DEMO_PASSWORD, demoUser } from './support/demo';
import { waitForMail, type CaughtMail } from './support/mailbox';

/** The link to a comparison that a review-request mail carries. */
function compareLinkIn(mail: CaughtMail): string {
  const match = /https?:\/\/\S+\/circuits\/[0-9a-f-]+\/compare\?\S+/.exec(mail.text);
  if (!match) throw new Error(`no comparison link in mail "${mail.subject}"`);
  return match[0];
}

async function signIn(page: Page, role: 'engineer' | 'reviewer', path: string) {
  const signInPage = new SignInPage(page);
  await signInPage.open(path);
  await signInPage.signIn(demoUser(role).email, DEMO_PASSWORD);
}

test('an engineer asks for a review, the reviewer asks for changes on the drawing, then approves the next revision', async ({ browser }) => {
  test.setTimeout(180_000);
  const engineer = await (await browser.newContext()).newPage();
  const reviewer = await (await browser.newContext()).newPage();
  const reviewerUser = demoUser('reviewer');
  const engineerUser = demoUser('engineer');

  // The engineer starts from a copy of the two-hand demo circuit.
  await signIn(engineer, 'engineer', '/circuits');
  await expect(engineer.getByTestId('circuit-table')).toBeVisible();
  const title = `Lid press for review ${Date.now()}`;
  const circuitId = await copyOfDemo(engineer, 'lid-press-two-hand', title);
  const editor = new EditorPage(engineer);
  await engineer.goto(`/circuits/${circuitId}`);
  await expect(editor.editor()).toBeVisible();

  // Revision 2: the flow control 1V3 set slower, and a check valve added.
  await editor.component('1V3').click();
  const opening = engineer.getByTestId('inspector-field-opening');
  await expect(opening).toHaveValue('25');
  await opening.fill('15');
  await opening.press('Enter');
  await editor.place('check-valve', { x: 120, y: 120 });
  await expect(editor.component('1V4')).toBeVisible();
  await editor.saveRevision('Slower lid, check valve on the gauge line');

  // The engineer asks the reviewer.
  await engineer.goto(`/circuits/${circuitId}/compare?to=2`);
  await engineer.getByTestId('compare-tab-review').click();
  await engineer.locator(`[data-testid="review-reviewer"][data-email="${reviewerUser.email}"]`).check();
  await engineer.getByTestId('review-message').fill('Please check the slower lid stroke.');
  await engineer.getByTestId('review-send').click();
  await expect(engineer.getByTestId('review-card-state')).toHaveText('waiting for review');

  // The reviewer follows the mail's link, signs in, and lands on the comparison.
  const mail = await waitForMail(reviewerUser.email, /asks you to check revision 2 of/, 15_000);
  const link = compareLinkIn(mail);
  await reviewer.goto(link);
  await reviewer.getByTestId('signin-email').waitFor();
  await new SignInPage(reviewer).signIn(reviewerUser.email, DEMO_PASSWORD);
  await expect(reviewer.getByTestId('compare-page')).toBeVisible();
  await expect(reviewer.getByTestId('compare-heading')).toHaveText('Revision 2, against 1');

  // Both changes are marked on the drawing and listed with their values.
  await expect(reviewer.locator('[data-testid="canvas-component"][data-tag="1V4"]')).toHaveAttribute('data-mark', 'added');
  await expect(reviewer.locator('[data-testid="canvas-component"][data-tag="1V3"]')).toHaveAttribute('data-mark', 'changed');
  await reviewer.getByTestId('compare-tab-changes').click();
  await expect(reviewer.locator('[data-testid="change-row"][data-tag="1V3"]')).toContainText('25 %');
  await expect(reviewer.locator('[data-testid="change-row"][data-tag="1V3"]')).toContainText('15 %');
  await expect(reviewer.locator('[data-testid="change-row"][data-tag="1V4"]')).toContainText('added');
  await reviewer.screenshot({ path: 'test-results/screens/review-compare-1440.png' });

  // A comment pinned to the check valve, then changes asked for.
  await reviewer.locator('[data-testid="canvas-component"][data-tag="1V4"]').click();
  await expect(reviewer.getByTestId('comment-anchor')).toHaveText('1V4');
  const question = `@${engineerUser.name.replace(/\s/g, '')} which way does 1V4 pass? <script>alert(1)</script> It needs a cracking pressure.`;
  await reviewer.getByTestId('comment-body').fill(question);
  await reviewer.getByTestId('comment-post').click();
  // Plain text: the script tag is shown as written, never run.
  await expect(reviewer.getByTestId('comment-text').first()).toHaveText(question);
  await expect(reviewer.locator('[data-testid="canvas-component"][data-tag="1V4"] [data-testid="comment-marker"]')).toContainText('1');
  await reviewer.getByTestId('compare-tab-review').click();
  await reviewer.getByTestId('review-note').fill('See my comment on 1V4.');
  await reviewer.getByTestId('review-request-changes').click();
  await expect(reviewer.getByTestId('review-card-state')).toHaveText('changes asked for');

  // The mention e-mailed the engineer, whose link opens the thread; they answer in it, set the
  // cracking pressure, save revision 3 and ask again.
  const mention = await waitForMail(engineerUser.email, new RegExp(`mentioned you on “${title}”`), 15_000);
  const commentLink = /https?:\/\/\S+\/circuits\/[0-9a-f-]+\?comment=[0-9a-f-]+/.exec(mention.text);
  expect(commentLink).not.toBeNull();
  await engineer.goto(commentLink![0]);
  await expect(engineer.locator('[data-testid="comment-thread"][data-focused]')).toContainText('which way does 1V4 pass?');
  await engineer.getByTestId('comment-reply').fill('It passes towards the gauge; cracking set to 0.2 bar in revision 3.');
  await engineer.getByTestId('comment-reply-send').click();
  await expect(engineer.getByTestId('comment-text')).toHaveCount(2);
  await engineer.screenshot({ path: 'test-results/screens/review-thread-1440.png' });
  await engineer.goto(`/circuits/${circuitId}`);
  await editor.component('1V4').click();
  const cracking = engineer.getByTestId('inspector-field-crackingPressure');
  await cracking.fill('0.2');
  await cracking.press('Enter');
  await editor.saveRevision('Cracking pressure on 1V4');
  await engineer.goto(`/circuits/${circuitId}/compare?to=3`);
  await engineer.getByTestId('compare-tab-review').click();
  await engineer.locator(`[data-testid="review-reviewer"][data-email="${reviewerUser.email}"]`).check();
  await engineer.getByTestId('review-message').fill('Cracking pressure set.');
  await engineer.getByTestId('review-send').click();
  await expect(engineer.getByTestId('review-card-state')).toHaveText('waiting for review');

  // The reviewer finds it in the reviews waiting for them, and approves.
  await reviewer.goto('/reviews');
  await reviewer.getByTestId('review-link').filter({ hasText: `${title} · revision 3` }).click();
  await expect(reviewer.getByTestId('compare-heading')).toHaveText('Revision 3, against 2');
  await reviewer.getByTestId('compare-tab-review').click();
  await reviewer.getByTestId('review-approve').click();
  await expect(reviewer.getByTestId('review-card-state')).toHaveText('approved');

  // The circuit page says which revision is approved, by whom and when.
  await engineer.goto(`/circuits/${circuitId}`);
  await expect(engineer.getByTestId('approval-note')).toContainText(`Approved revision 3 by ${reviewerUser.name}`);
  await expect(engineer.getByTestId('approval-note').locator('time')).toHaveAttribute('datetime', /^\d{4}-\d\d-\d\dT/);
});

test('a run saved in the editor replays on the review page, and a comment can be pinned to a moment of it', async ({ page }) => {
  test.setTimeout(120_000);
  await signIn(page, 'engineer', '/circuits');
  await expect(page.getByTestId('circuit-table')).toBeVisible();
  const circuitId = await copyOfDemo(page, 'lid-press-two-hand', `Lid press run to replay ${Date.now()}`);
  const editor = new EditorPage(page);
  await page.goto(`/circuits/${circuitId}`);
  await page.getByTestId('run-start').click();
  await expect.poll(() => editor.runTime()).toBeGreaterThan(0.2);
  await editor.component('1S1').click({ modifiers: ['Shift'] });
  await editor.component('1S2').click({ modifiers: ['Shift'] });
  await expect.poll(() => editor.extension('1A1'), { timeout: 20_000 }).toBeGreaterThan(0.999);
  await page.getByTestId('run-save').click();
  await expect(page.getByTestId('run-save-note')).toContainText('saved with revision 1');

  // The saved run plays back on the review page: at its end the piston is out, at its start it is in.
  await page.goto(`/circuits/${circuitId}/compare?from=1&to=1`);
  await page.getByTestId('compare-tab-runs').click();
  await page.getByTestId('saved-run-open').click();
  const slider = page.getByTestId('replay-slider');
  await expect(slider).toBeVisible();
  const end = Number(await slider.getAttribute('max'));
  expect(end).toBeGreaterThan(0.5);
  await slider.fill(String(end));
  await expect.poll(() => editor.extension('1A1')).toBeGreaterThan(0.999);
  await slider.fill('0');
  await expect.poll(() => editor.extension('1A1')).toBeLessThan(0.001);
  await slider.fill(String(end));
  await page.getByTestId('replay-pin').click();
  await expect(page.getByTestId('comment-anchor')).toContainText('a saved run at t =');
  await page.getByTestId('comment-body').fill('Piston fully out here.');
  await page.getByTestId('comment-post').click();
  await expect(page.getByTestId('comment-thread-anchor')).toContainText('a saved run at t =');

  // The author can edit the comment; anyone who comments can resolve the thread, which then folds away.
  await page.getByTestId('comment-edit').click();
  await page.getByRole('textbox', { name: 'Edit the comment' }).fill('Piston fully out and resting on its stop here.');
  await page.getByRole('button', { name: 'Save', exact: true }).click();
  await expect(page.getByTestId('comment-text')).toHaveText('Piston fully out and resting on its stop here.');
  await expect(page.getByTestId('comment-entry')).toContainText('edited');
  await page.getByTestId('comment-resolve').click();
  await expect(page.locator('[data-testid="comment-thread"][data-resolved]')).toHaveCount(1);
  await expect(page.getByText('Resolved (1)')).toBeVisible();

  // A tube can carry a thread too: click it on the drawing.
  const onTube = await editor.pointOnTube();
  await page.mouse.click(onTube.x, onTube.y);
  await expect(page.getByTestId('comment-anchor')).toContainText('the tube');
});
