import { expect, type Locator, type Page } from '@playwright/test';

/** The circuit editor as a user sees it: palette, canvas, toolbar. */
export class EditorPage {
  constructor(private readonly page: Page) {}

  editor() {
    return this.page.getByTestId('circuit-editor');
  }

  canvas() {
    return this.page.getByTestId('canvas');
  }

  revisionState() {
    return this.page.getByTestId('revision-state');
  }

  summary() {
    return this.page.getByTestId('editor-summary');
  }

  component(tag: string): Locator {
    return this.page.locator(`[data-testid="canvas-component"][data-tag="${tag}"]`);
  }

  port(tag: string, port: string): Locator {
    return this.component(tag).locator(`[data-testid="port"][data-port="${port}"]`);
  }

  /** Drags a part from the palette onto the canvas at a point given relative to the canvas's top-left corner. */
  async place(typeId: string, at: { x: number; y: number }): Promise<void> {
    await this.page.getByTestId(`palette-item-${typeId}`).dragTo(this.canvas(), { targetPosition: at });
  }

  /** Draws a tube or wire from one port to another with the mouse, as a user does. */
  async join(from: Locator, to: Locator): Promise<void> {
    const a = await from.boundingBox();
    const b = await to.boundingBox();
    if (!a || !b) throw new Error('port not on screen');
    await this.page.mouse.move(a.x + a.width / 2, a.y + a.height / 2);
    await this.page.mouse.down();
    await this.page.mouse.move((a.x + b.x) / 2, (a.y + b.y) / 2, { steps: 5 });
    await this.page.mouse.move(b.x + b.width / 2, b.y + b.height / 2, { steps: 5 });
    await this.page.mouse.up();
  }

  async saveRevision(message: string): Promise<void> {
    await this.page.getByTestId('save-revision').click();
    await this.page.getByTestId('save-message').fill(message);
    await this.page.getByTestId('save-confirm').click();
    await expect(this.page.getByTestId('editor-notice')).toContainText('Saved as revision');
  }

  /** Creates a circuit from the circuits list (the page must show it) and opens it in the editor. */
  async createAndOpen(title: string): Promise<void> {
    await this.page.getByTestId('new-circuit').click();
    await this.page.getByTestId('new-circuit-title').fill(title);
    await this.page.getByTestId('new-circuit-submit').click();
    await this.page.getByTestId('circuit-link').filter({ hasText: title }).click();
    await expect(this.editor()).toBeVisible();
  }

  /** Opens a circuit by its title through the API (the list pages; tests add circuits of their own). */
  async openByTitle(title: string): Promise<void> {
    const list = (await this.page.evaluate(() => fetch('/api/circuits?pageSize=100').then((r) => r.json()))) as { items: Array<{ id: string; title: string }> };
    const circuit = list.items.find((c) => c.title === title);
    if (!circuit) throw new Error(`no circuit titled ${title}`);
    await this.page.goto(`/circuits/${circuit.id}`);
    await expect(this.editor()).toBeVisible();
  }

  /** A point on some tube of the drawing that no part covers, in page coordinates. */
  async pointOnTube(): Promise<{ x: number; y: number }> {
    const point = await this.page.evaluate(() => {
      for (const path of document.querySelectorAll<SVGPathElement>('.react-flow__edge.airproof-tube path.react-flow__edge-interaction')) {
        for (let share = 0.1; share < 0.95; share += 0.1) {
          const at = path.getPointAtLength(path.getTotalLength() * share);
          const screen = new DOMPoint(at.x, at.y).matrixTransform(path.getScreenCTM()!);
          if (document.elementFromPoint(screen.x, screen.y)?.closest('.react-flow__edge') === path.closest('.react-flow__edge')) return { x: screen.x, y: screen.y };
        }
      }
      return null;
    });
    if (!point) throw new Error('no tube on screen');
    return point;
  }

  async runTime(): Promise<number> {
    return Number(await this.page.getByTestId('run-time').getAttribute('data-t'));
  }

  async extension(tag: string): Promise<number> {
    return Number(await this.component(tag).getAttribute('data-extension'));
  }

  /** Holds the mouse on a part for a while, as a hand on a push-button. */
  async hold(part: Locator, ms: number): Promise<void> {
    const box = await part.boundingBox();
    if (!box) throw new Error('part not on screen');
    await this.page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await this.page.mouse.down();
    await this.page.waitForTimeout(ms);
    await this.page.mouse.up();
  }
}
