import { beforeAll, describe, expect, it, vi } from 'vitest';
import * as circuitProofs from '@/app/api/circuits/[id]/proofs/route';
import { ruleTemplates } from '@/engine/proof/rules';
import { createCircuit } from '@/lib/circuits/create-circuit';
import { Proof } from '@/models';
import { callRoute, lidPress } from '../call-route';
import { createTestWorkspace, type TestWorkspace } from '../fixtures';

// The queue refusing every job, as when pg-boss cannot reach its schema.
vi.mock('@/lib/jobs/queue', () => ({
  sendProofJob: vi.fn(async () => {
    throw new Error('connect ECONNREFUSED 127.0.0.1:5432');
  }),
  stopBoss: vi.fn(async () => undefined),
}));

describe('starting a proof while the queue refuses jobs', () => {
  let ws: TestWorkspace;
  let circuitId: string;
  const { document } = lidPress();

  beforeAll(async () => {
    ws = await createTestWorkspace('proof-queue');
    circuitId = (await createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.engineer.id, input: { title: 'Lid press, queue down', description: '', message: '', document } })).id;
  });

  it('answers 503 and marks the proof failed, so no proof waits for a job that was never sent', async () => {
    vi.spyOn(console, 'error').mockImplementation(() => undefined);
    const body = { revisionNumber: 1, rulesText: ruleTemplates(document).find((t) => t.id === 'two-hand-1A1')!.text, variations: [{ tag: '1S1', kind: 'button' }], quantumS: 0.5, steps: 2, settleS: 1 };
    const refused = await callRoute<{ error: { code: string; message: string } }>(circuitProofs.POST, `/api/circuits/${circuitId}/proofs`, { userId: ws.users.engineer.id, method: 'POST', body, id: circuitId });
    expect(refused.status).toBe(503);
    expect(refused.json.error.code).toBe('unavailable:queue');
    const rows = await Proof.findAll({ include: [{ association: 'revision', where: { circuitId } }] });
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ status: 'failed', error: 'The proof could not be queued; start it again' });
    expect(rows[0]!.finishedAt).toBeInstanceOf(Date);
  });
});
