import { readFileSync } from 'node:fs';
import type { Page } from '@playwright/test';
import { DEMO_CIRCUITS, DEMO_PASSWORD, DEMO_USERS } from '../../demo/plant';

export { DEMO_CIRCUITS, DEMO_PASSWORD };

export function demoUser(role: (typeof DEMO_USERS)[number]['role']): { email: string; name: string } {
  const user = DEMO_USERS.find((u) => u.role === role);
  if (!user) throw new Error(`no demo user for ${role}`);
  return user;
}

/** A copy of a demo circuit (its file name in demo/circuits, without .json), made through the API as an import would; returns its id. */
export async function copyOfDemo(page: Page, file: string, title: string): Promise<string> {
  const demoDocument: unknown = JSON.parse(readFileSync(`demo/circuits/${file}.json`, 'utf8'));
  const created = await page.evaluate(
    async ({ title, document }) => {
      const response = await fetch('/api/circuits', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ title, document }) });
      return (await response.json()) as { id: string };
    },
    { title, document: demoDocument },
  );
  return created.id;
}

/** The id of a circuit of the signed-in person's workspace, by its title (the demo circuits are seeded under theirs). */
export async function circuitIdByTitle(page: Page, title: string): Promise<string> {
  const id = await page.evaluate(async (wanted) => {
    const response = await fetch('/api/circuits?pageSize=100');
    const body = (await response.json()) as { items: Array<{ id: string; title: string }> };
    return body.items.find((c) => c.title === wanted)?.id ?? null;
  }, title);
  if (!id) throw new Error(`no circuit titled "${title}"`);
  return id;
}
