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

test('the two-hand demo extends only once both buttons are pressed on the drawing', async ({ page }) => {
  const editor = new EditorPage(page);
  await editor.openByTitle(DEMO_CIRCUITS[0]!.title);
  await page.getByTestId('run-start').click();
  // The plot under the drawing takes room: bring every part into view.
  await page.getByTestId('fit').click();
  await expect.poll(() => editor.runTime()).toBeGreaterThan(0.3);

  // One hand: the two-pressure valve passes nothing, the press stays up.
  await editor.component('1S1').click({ modifiers: ['Shift'] });
  const oneHandFrom = await editor.runTime();
  await expect.poll(() => editor.runTime()).toBeGreaterThan(oneHandFrom + 0.5);
  expect(await editor.extension('1A1')).toBeLessThan(0.001);

  // Both hands: the press comes down to its end.
  await editor.component('1S2').click({ modifiers: ['Shift'] });
  await expect.poll(() => editor.extension('1A1'), { timeout: 20_000 }).toBeGreaterThan(0.999);

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
