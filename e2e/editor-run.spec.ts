import { mkdirSync, writeFileSync } from 'node:fs';
import { expect, test } from '@playwright/test';
import { EditorPage } from './pages/editor-page';
import { SignInPage } from './pages/sign-in-page';
import { DEMO_CIRCUITS, DEMO_PASSWORD, demoUser } from './support/demo';

test.beforeEach(async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open('/circuits');
  await signIn.signIn(demoUser('engineer').email, DEMO_PASSWORD);
  await expect(page.getByTestId('circuit-table')).toBeVisible();
});

/**
 * A running two-hand start (buttons 1S1 and 1S2, cylinder 1A1): one button kept pressed leaves
 * the piston in for half a second of machine time; the second brings it to its end.
 */
async function bothHandsNeeded(editor: EditorPage): Promise<void> {
  await expect.poll(() => editor.runTime()).toBeGreaterThan(0.3);
  await editor.component('1S1').click({ modifiers: ['Shift'] });
  const oneHandFrom = await editor.runTime();
  await expect.poll(() => editor.runTime()).toBeGreaterThan(oneHandFrom + 0.5);
  expect(await editor.extension('1A1')).toBeLessThan(0.001);
  await editor.component('1S2').click({ modifiers: ['Shift'] });
  await expect.poll(() => editor.extension('1A1'), { timeout: 20_000 }).toBeGreaterThan(0.999);
}

test('the two-hand demo extends only once both buttons are pressed on the drawing', async ({ page }) => {
  const editor = new EditorPage(page);
  await editor.openByTitle(DEMO_CIRCUITS[0]!.title);
  await page.getByTestId('run-start').click();
  // The plot under the drawing takes room: bring every part into view.
  await page.getByTestId('fit').click();
  await bothHandsNeeded(editor);

  await page.setViewportSize({ width: 390, height: 844 });
  await page.getByTestId('fit').click();
  await page.screenshot({ path: 'test-results/screens/editor-run-390.png' });
});

test('a run of the largest demo circuit plays on the drawing; frames per second are reported', async ({ page }) => {
  const largest = DEMO_CIRCUITS.find((c) => c.file === 'lid-press-relay-control.json')!;
  const editor = new EditorPage(page);
  await editor.openByTitle(largest.title);
  await page.getByTestId('run-start').click();
  await page.getByTestId('fit').click();
  await expect.poll(() => editor.runTime()).toBeGreaterThan(0.2);
  // Start: S1 latches K1, the solenoid drives the press down.
  await editor.hold(editor.component('S1'), 300);
  await expect.poll(() => editor.extension('1A1'), { timeout: 20_000 }).toBeGreaterThan(0.5);
  // The latched relay keeps current in its wires: some are drawn live, others dead, with the key to both.
  await expect.poll(() => page.locator('.react-flow__edge.airproof-wire-live').count()).toBeGreaterThan(0);
  expect(await page.locator('.react-flow__edge.airproof-wire-dead').count()).toBeGreaterThan(0);
  await expect(page.getByTestId('wire-legend')).toBeVisible();
  // Pointing at a tube reads out its pressure and the air going into it.
  const onTube = await editor.pointOnTube();
  await page.mouse.move(onTube.x, onTube.y);
  await expect(page.locator('.react-flow__edge-textwrapper, .react-flow__edge-text').first()).toContainText(/bar \(gauge\) · \d+\.\d l\/min \(ANR\)/);
  // A port says its pressure in its tooltip.
  await expect(editor.port('1A1', 'A')).toHaveAttribute('title', /^1A1 port A \(cap end\): -?\d+\.\d\d bar \(gauge\) · \d+\.\d l\/min \(ANR\) (in|out)$/);
  await page.screenshot({ path: 'test-results/screens/editor-relay-run-1440.png' });

  const measured = await page.evaluate(
    () =>
      new Promise<{ frames: number; seconds: number }>((resolve) => {
        let frames = 0;
        const started = performance.now();
        const tick = (now: number) => {
          frames += 1;
          if (now - started < 3000) requestAnimationFrame(tick);
          else resolve({ frames, seconds: (now - started) / 1000 });
        };
        requestAnimationFrame(tick);
      }),
  );
  const fps = measured.frames / measured.seconds;
  const line = `frames per second during a run of "${largest.title}" (${page.viewportSize()?.width} px wide, headless Chromium): ${fps.toFixed(1)}`;
  console.log(line);
  mkdirSync('test-results', { recursive: true });
  writeFileSync('test-results/editor-fps.txt', `${line}\n`);
});

test('a new two-hand circuit drawn from the parts list runs: both buttons bring the piston to its end', async ({ page }) => {
  test.setTimeout(120_000);
  const editor = new EditorPage(page);
  await editor.createAndOpen(`Two-hand from scratch ${Date.now()}`);

  // Away from the canvas's edges: a connection dragged near an edge pans the view.
  await editor.place('cylinder-double-acting', { x: 380, y: 90 });
  await editor.place('one-way-flow-control', { x: 600, y: 180 });
  await editor.place('valve-5-2', { x: 380, y: 240 });
  await editor.place('two-pressure-valve', { x: 380, y: 330 });
  await editor.place('valve-3-2-nc', { x: 250, y: 420 });
  await editor.place('valve-3-2-nc', { x: 530, y: 420 });
  await editor.place('air-supply', { x: 130, y: 430 });
  await expect(editor.summary()).toHaveText('7 components · 0 tubes · 0 wires');

  // Designations in the order the parts came: 1V1 the flow control, 1V2 the 5/2 valve, 1V3 the two-pressure valve.
  const joins: Array<[string, string, string, string]> = [
    ['0Z1', '2', '1S1', '1'],
    ['0Z1', '2', '1S2', '1'],
    ['0Z1', '2', '1V2', '1'],
    ['1S1', '2', '1V3', '1.1'],
    ['1S2', '2', '1V3', '1.2'],
    ['1V3', '2', '1V2', '14'],
    ['1V2', '4', '1A1', 'A'],
    ['1V2', '2', '1V1', '1'],
    ['1V1', '2', '1A1', 'B'],
  ];
  for (const [a, pa, b, pb] of joins) await editor.join(editor.port(a, pa), editor.port(b, pb));
  await expect(editor.summary()).toHaveText(`7 components · ${joins.length} tubes · 0 wires`);

  // The main valve is worked by the two-pressure valve's air, not by a button.
  await editor.component('1V2').click();
  await page.getByTestId('inspector-field-actuation').selectOption('pilot');
  await expect(page.getByTestId('checks-summary')).not.toContainText('error');
  await editor.saveRevision('Two-hand start from scratch');

  await page.getByTestId('run-start').click();
  await bothHandsNeeded(editor);
  await page.screenshot({ path: 'test-results/screens/editor-two-hand-1440.png' });
});

test('a stuck spool injected into the live run keeps the press in; taken out again, the press works', async ({ page }) => {
  const editor = new EditorPage(page);
  await editor.openByTitle(DEMO_CIRCUITS[0]!.title);
  await page.getByTestId('run-faults').click();
  await page.getByTestId('fault-pick').selectOption('spool-stuck|1V2');
  await page.getByTestId('fault-add').click();
  await expect(page.getByTestId('fault-description')).toContainText('1V2');
  await expect(page.getByTestId('run-faults')).toHaveText('Faults (1)');
  // The panel folds away and leaves the drawing its room; the fault stays in.
  await page.getByTestId('run-faults').click();
  await expect(page.getByTestId('fault-panel')).toHaveCount(0);
  await page.getByTestId('run-start').click();
  await page.getByTestId('fit').click();
  await expect.poll(() => editor.runTime()).toBeGreaterThan(0.3);
  await editor.component('1S1').click({ modifiers: ['Shift'] });
  await editor.component('1S2').click({ modifiers: ['Shift'] });
  const pressedAt = await editor.runTime();
  await expect.poll(() => editor.runTime()).toBeGreaterThan(pressedAt + 1.5);
  expect(await editor.extension('1A1')).toBeLessThan(0.001);
  // A run with a fault in it is not the revision's: it is not saved.
  await page.getByTestId('run-save').click();
  await expect(page.getByTestId('run-save-note')).toContainText('injected faults');

  // Removing the fault starts the run again, healthy.
  await page.getByTestId('run-faults').click();
  await page.getByTestId('fault-item').getByRole('button', { name: 'Remove' }).click();
  await expect(page.getByTestId('run-faults')).toHaveText('Faults');
  await page.getByTestId('run-faults').click();
  await page.getByTestId('fit').click();
  await bothHandsNeeded(editor);
});
