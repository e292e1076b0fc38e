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
}
