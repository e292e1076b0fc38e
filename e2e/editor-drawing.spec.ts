import { expect, test, type Locator } from '@playwright/test';
import { EditorPage } from './pages/editor-page';
import { SignInPage } from './pages/sign-in-page';
import { DEMO_PASSWORD, demoUser } from './support/demo';

async function box(locator: Locator) {
  const b = await locator.boundingBox();
  if (!b) throw new Error('not on screen');
  return b;
}

test('an engineer turns, flips and lines up parts, and bends a tube; each is one undo step and is saved', async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open('/circuits');
  await signIn.signIn(demoUser('engineer').email, DEMO_PASSWORD);
  const editor = new EditorPage(page);
  await editor.createAndOpen(`Drawing tools ${Date.now()}`);

  await editor.place('valve-3-2-nc', { x: 300, y: 380 });
  await editor.place('valve-3-2-nc', { x: 520, y: 300 });
  await editor.place('cylinder-double-acting', { x: 420, y: 120 });
  await expect(editor.summary()).toHaveText('3 components · 0 tubes · 0 wires');

  // Turn: a quarter turn swaps the symbol's width and height; R again and Shift+R turn it on and back.
  const valve = editor.component('1S1');
  const upright = await box(valve);
  await valve.click();
  await page.getByTestId('turn-selection').click();
  await expect.poll(async () => Math.round((await box(valve)).width)).toBe(Math.round(upright.height));
  expect(Math.round((await box(valve)).height)).toBe(Math.round(upright.width));
  await page.keyboard.press('Shift+R');
  await expect.poll(async () => Math.round((await box(valve)).width)).toBe(Math.round(upright.width));
  await page.keyboard.press('r');
  await expect.poll(async () => Math.round((await box(valve)).width)).toBe(Math.round(upright.height));
  await page.getByTestId('undo').click();
  await expect.poll(async () => Math.round((await box(valve)).width)).toBe(Math.round(upright.width));

  // Flip: the cylinder's ports change sides (A was left of B).
  const cylinder = editor.component('1A1');
  await cylinder.click();
  const aBefore = (await box(editor.port('1A1', 'A'))).x;
  const bBefore = (await box(editor.port('1A1', 'B'))).x;
  expect(aBefore).toBeLessThan(bBefore);
  await page.keyboard.press('f');
  await expect.poll(async () => (await box(editor.port('1A1', 'A'))).x - (await box(editor.port('1A1', 'B'))).x).toBeGreaterThan(20);
  await page.keyboard.press('f');
  await expect.poll(async () => Math.round((await box(editor.port('1A1', 'A'))).x)).toBe(Math.round(aBefore));

  // Align: two valves at different heights end up with their top edges level.
  const other = editor.component('1S2');
  await valve.click();
  await other.click({ modifiers: ['Shift'] });
  expect(Math.abs((await box(valve)).y - (await box(other)).y)).toBeGreaterThan(20);
  await page.getByTestId('align-selection').selectOption('align:top');
  await expect.poll(async () => Math.round(Math.abs((await box(valve)).y - (await box(other)).y))).toBe(0);
  await page.getByTestId('undo').click();
  await expect.poll(async () => Math.abs((await box(valve)).y - (await box(other)).y)).toBeGreaterThan(20);

  // A tube from the valve to the cylinder, then a bend: select it, drag the middle run sideways.
  await editor.join(editor.port('1S2', '2'), editor.port('1A1', 'A'));
  await expect(editor.summary()).toHaveText('3 components · 1 tube · 0 wires');
  const tube = page.locator('.react-flow__edge.airproof-tube');
  const path = tube.locator('path.react-flow__edge-path');
  const straight = await path.getAttribute('d');
  await tube.locator('path.react-flow__edge-interaction').click({ force: true });
  const run = page.getByTestId('run-handle').first();
  await expect(run).toBeVisible();
  const handle = await box(run);
  const horizontal = (await run.getAttribute('class'))?.includes('row-resize');
  await page.mouse.move(handle.x + handle.width / 2, handle.y + handle.height / 2);
  await page.mouse.down();
  const to = horizontal ? { x: handle.x + handle.width / 2, y: handle.y - 60 } : { x: handle.x - 60, y: handle.y + handle.height / 2 };
  await page.mouse.move(to.x, to.y, { steps: 6 });
  await page.mouse.up();
  await expect.poll(() => path.getAttribute('d')).not.toBe(straight);
  const bent = await path.getAttribute('d');
  await page.getByTestId('undo').click();
  await expect.poll(() => path.getAttribute('d')).toBe(straight);
  await page.getByTestId('redo').click();
  await expect.poll(() => path.getAttribute('d')).toBe(bent);

  // What was drawn is saved with the revision: the bend comes back after a reload.
  await editor.saveRevision('Tools check');
  await page.reload();
  await expect(editor.editor()).toBeVisible();
  await expect.poll(() => page.locator('.react-flow__edge.airproof-tube path.react-flow__edge-path').getAttribute('d')).toBe(bent);
  await page.screenshot({ path: 'test-results/screens/editor-drawing-1440.png' });
});
