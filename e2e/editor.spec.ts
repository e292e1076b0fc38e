import { expect, test } from '@playwright/test';
import { EditorPage } from './pages/editor-page';
import { SignInPage } from './pages/sign-in-page';
import { DEMO_PASSWORD, demoUser } from './support/demo';

test('an engineer draws a circuit, undoes and redoes, saves a revision and finds it after a reload', async ({ page, browser }) => {
  const signIn = new SignInPage(page);
  await signIn.open('/circuits');
  await signIn.signIn(demoUser('engineer').email, DEMO_PASSWORD);
  await expect(page).toHaveURL(/\/circuits$/);

  const title = `Editor walk-through ${Date.now()}`;
  const editor = new EditorPage(page);
  await editor.createAndOpen(title);
  await expect(editor.revisionState()).toContainText('Revision 1');
  await expect(editor.summary()).toHaveText('0 components · 0 tubes · 0 wires');

  await editor.place('air-supply', { x: 420, y: 460 });
  await editor.place('valve-5-2', { x: 520, y: 300 });
  await editor.place('cylinder-double-acting', { x: 520, y: 120 });
  await expect(editor.summary()).toHaveText('3 components · 0 tubes · 0 wires');
  await expect(editor.component('0Z1')).toBeVisible();
  await expect(editor.component('1V1')).toBeVisible();
  await expect(editor.component('1A1')).toBeVisible();
  // Nothing joined yet: the checks list the open ports, and picking one selects its part.
  await expect(page.getByTestId('checks-summary')).toContainText('warning');
  await page.getByTestId('checks-toggle').click();
  await page.getByTestId('check-item').filter({ hasText: '1A1' }).first().click();
  await expect(page.locator('.react-flow__node.selected [data-tag="1A1"]')).toBeVisible();
  await page.getByTestId('checks-toggle').click();

  await editor.join(editor.port('0Z1', '2'), editor.port('1V1', '1'));
  await editor.join(editor.port('1V1', '4'), editor.port('1A1', 'A'));
  await editor.join(editor.port('1V1', '2'), editor.port('1A1', 'B'));
  await expect(editor.summary()).toHaveText('3 components · 3 tubes · 0 wires');

  // Undo takes back the last tube, redo brings it again; the keyboard does the same.
  await page.getByTestId('undo').click();
  await expect(editor.summary()).toHaveText('3 components · 2 tubes · 0 wires');
  await page.getByTestId('redo').click();
  await expect(editor.summary()).toHaveText('3 components · 3 tubes · 0 wires');
  await editor.canvas().click({ position: { x: 700, y: 40 } });
  await page.keyboard.press('Control+z');
  await expect(editor.summary()).toHaveText('3 components · 2 tubes · 0 wires');
  await page.keyboard.press('Control+Shift+z');
  await expect(editor.summary()).toHaveText('3 components · 3 tubes · 0 wires');
  await expect(editor.revisionState()).toContainText('unsaved changes');

  // Duplicate and copy-paste make a new part with the next designation; undo takes it away again.
  await editor.component('1A1').click();
  await page.getByTestId('duplicate').click();
  await expect(editor.summary()).toHaveText('4 components · 3 tubes · 0 wires');
  await expect(editor.component('2A1')).toBeVisible();
  await page.getByTestId('undo').click();
  await editor.component('1V1').click();
  await page.keyboard.press('Control+c');
  await page.keyboard.press('Control+v');
  await expect(editor.component('1V2')).toBeVisible();
  await page.getByTestId('undo').click();
  await expect(editor.summary()).toHaveText('3 components · 3 tubes · 0 wires');

  // The details form: the cylinder's stroke in mm, checked against its range, undone like any edit.
  await editor.component('1A1').click();
  const stroke = page.getByTestId('inspector-field-stroke');
  await expect(stroke).toHaveValue('100');
  await stroke.fill('5000');
  await stroke.press('Enter');
  await expect(page.getByTestId('inspector-error-stroke')).toContainText('between');
  await stroke.fill('50');
  await stroke.press('Enter');
  await expect(page.getByTestId('inspector-error-stroke')).toHaveCount(0);
  await page.getByTestId('undo').click();
  await editor.component('1A1').click();
  await expect(stroke).toHaveValue('100');
  await page.getByTestId('redo').click();
  await editor.component('1A1').click();
  await expect(stroke).toHaveValue('50');
  // A label shows on the drawing; notes take several lines and are kept with the part.
  await page.getByTestId('inspector-label').fill('Lid clamp');
  await page.getByTestId('inspector-label').press('Enter');
  await expect(editor.component('1A1').getByTestId('canvas-label')).toHaveText('Lid clamp');
  await page.getByTestId('inspector-notes').fill('Stroke cut to 50 mm for the shallow lids.\nCheck the cushion after a seal change.');
  await page.getByTestId('inspector-field-stroke').focus();
  await editor.component('1V1').click();
  await editor.component('1A1').click();
  await expect(page.getByTestId('inspector-notes')).toHaveValue('Stroke cut to 50 mm for the shallow lids.\nCheck the cushion after a seal change.');

  await page.screenshot({ path: 'test-results/screens/editor-1440.png' });
  await editor.saveRevision('Supply, 5/2 valve and cylinder');
  await expect(editor.revisionState()).toHaveText(/Revision 2$/);

  await page.reload();
  await expect(editor.revisionState()).toHaveText(/Revision 2$/);
  await expect(editor.summary()).toHaveText('3 components · 3 tubes · 0 wires');

  // Unsaved work survives a reload of the same revision.
  await editor.place('throttle', { x: 200, y: 200 });
  await expect(editor.summary()).toHaveText('4 components · 3 tubes · 0 wires');
  await page.reload();
  await expect(page.getByTestId('draft-restored')).toBeVisible();
  await expect(editor.summary()).toHaveText('4 components · 3 tubes · 0 wires');
  await page.getByRole('button', { name: 'Discard them' }).click();
  await expect(editor.summary()).toHaveText('3 components · 3 tubes · 0 wires');

  // Run it: hold the 5/2 valve's push-button on the drawing and watch the piston reach its end.
  await page.getByTestId('run-start').click();
  await expect.poll(async () => Number(await page.getByTestId('run-time').getAttribute('data-t'))).toBeGreaterThan(0.2);
  await expect(page.getByTestId('pressure-legend')).toBeVisible();
  const valve = await editor.component('1V1').boundingBox();
  if (!valve) throw new Error('valve not on screen');
  await page.mouse.move(valve.x + valve.width / 2, valve.y + valve.height / 2);
  await page.mouse.down();
  await expect.poll(async () => Number(await editor.component('1A1').getAttribute('data-extension')), { timeout: 15_000 }).toBeGreaterThan(0.999);
  await expect(editor.component('1V1')).toHaveAttribute('data-active-position', '0');
  await page.screenshot({ path: 'test-results/screens/editor-run-1440.png' });
  await page.mouse.up();
  await expect.poll(async () => Number(await editor.component('1A1').getAttribute('data-extension')), { timeout: 15_000 }).toBeLessThan(0.001);
  // The plot shows the piston's travel and its port pressures; the whole run downloads as CSV.
  await page.getByTestId('run-plot').click();
  await expect(page.getByTestId('trace-plot')).toContainText('1A1 position');
  await expect(page.locator('[data-testid="plot-area"] canvas')).toBeVisible();
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('plot-csv').click()]);
  const csv = await (await download.createReadStream()).toArray();
  expect(Buffer.concat(csv).toString('utf8')).toMatch(/^time_s,.*cylinder-double-acting-1:x/);
  await page.getByTestId('run-stop').click();
  await expect(page.getByTestId('pressure-legend')).toHaveCount(0);

  await page.setViewportSize({ width: 390, height: 844 });
  await expect(editor.editor()).toBeVisible();
  await page.getByTestId('fit').click();
  await expect(editor.component('1V1')).toBeInViewport();
  await page.screenshot({ path: 'test-results/screens/editor-390.png' });
  const circuitUrl = page.url();

  // A reviewer sees the same drawing, read-only.
  const reviewerContext = await browser.newContext({ viewport: { width: 1440, height: 900 } });
  const reviewer = await reviewerContext.newPage();
  const reviewerSignIn = new SignInPage(reviewer);
  await reviewerSignIn.open(new URL(circuitUrl).pathname);
  await reviewerSignIn.signIn(demoUser('reviewer').email, DEMO_PASSWORD);
  const reviewerEditor = new EditorPage(reviewer);
  await expect(reviewerEditor.summary()).toHaveText('3 components · 3 tubes · 0 wires');
  await expect(reviewer.getByTestId('read-only-note')).toBeVisible();
  await expect(reviewer.getByTestId('palette')).toHaveCount(0);
  await expect(reviewer.getByTestId('save-revision')).toHaveCount(0);
  await reviewer.screenshot({ path: 'test-results/screens/editor-reviewer-1440.png' });
  await reviewerContext.close();
});
