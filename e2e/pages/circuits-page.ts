import type { Page } from '@playwright/test';

export class CircuitsPage {
  constructor(private readonly page: Page) {}

  async open(): Promise<void> {
    await this.page.goto('/circuits');
  }

  table() {
    return this.page.getByTestId('circuit-table');
  }

  rows() {
    return this.page.getByTestId('circuit-row');
  }

  sortBy(column: string) {
    return this.page.getByRole('button', { name: new RegExp(`^${column}`, 'i') });
  }
}
