import { createServer } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as circuitRuns from '@/app/api/circuits/[id]/runs/route';
import { createCircuit } from '@/lib/circuits/create-circuit';
import { Run } from '@/models';
import { callRoute, lidPress } from '../call-route';
import { createTestWorkspace, type TestWorkspace } from '../fixtures';

/** A local port that nothing listens on. */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as { port: number };
  await new Promise<void>((resolve) => server.close(() => resolve()));
  return port;
}

describe('saving a run while object storage is down', () => {
  const configured = process.env.S3_ENDPOINT;
  let ws: TestWorkspace;
  let circuitId: string;

  beforeAll(async () => {
    // Before anything reads the configuration, which is then kept for this file's modules.
    process.env.S3_ENDPOINT = `http://127.0.0.1:${await closedPort()}`;
    ws = await createTestWorkspace('runs-down');
    circuitId = (await createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.engineer.id, input: { title: 'Lid press cell 3', description: '', message: '', document: lidPress().document } })).id;
  });

  afterAll(() => {
    process.env.S3_ENDPOINT = configured;
  });

  it('answers 503 and keeps no run whose trace was never stored', async () => {
    const { inputs } = lidPress();
    const refused = await callRoute<{ error: object }>(circuitRuns.POST, `/api/circuits/${circuitId}/runs`, { userId: ws.users.engineer.id, method: 'POST', body: { revisionNumber: 1, inputs, untilS: 3 }, id: circuitId });
    expect(refused).toEqual({ status: 503, json: { error: { code: 'unavailable:storage', message: 'File storage is not answering; try again in a moment' } } });
    expect(await Run.count({ include: [{ association: 'revision', where: { circuitId } }] })).toBe(0);
  });
});
