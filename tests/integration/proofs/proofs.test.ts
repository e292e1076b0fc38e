import { gunzipSync } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as circuitProofs from '@/app/api/circuits/[id]/proofs/route';
import * as proofCancel from '@/app/api/proofs/[id]/cancel/route';
import * as proofOne from '@/app/api/proofs/[id]/route';
import * as runOne from '@/app/api/runs/[id]/route';
import * as runTrace from '@/app/api/runs/[id]/trace/route';
import { ruleTemplates } from '@/engine/proof/rules';
import type { InputEvent } from '@/engine/solver/simulate';
import type { Trace } from '@/engine/trace/trace';
import { createCircuit } from '@/lib/circuits/create-circuit';
import { startProofWorker } from '@/lib/jobs/proof-worker';
import type { QueueWorker } from '@/lib/jobs/queue';
import type { ProofDetail, ProofPage } from '@/lib/proofs/proofs';
import { getObject } from '@/lib/storage/object-store';
import { AuditEvent, Proof, Run } from '@/models';
import { callRoute, lidPress } from '../call-route';
import { createTestWorkspace, type TestWorkspace } from '../fixtures';

interface ErrorJson {
  error: { code: string; message: string; field?: string; errors?: Array<{ line: number; column: number; message: string }> };
}

const FINISHED = ['succeeded', 'failed', 'cancelled'];
const SYNCHRONOUS_S = 0.5;

describe('proofs', () => {
  let ws: TestWorkspace;
  let circuitId: string;
  let worker: QueueWorker;
  const { document } = lidPress();
  const twoHand = ruleTemplates(document).find((t) => t.id === 'two-hand-1A1')!;
  const STARTS_ONLY_ON_TWO_HANDS = '1A1 moves out only on a two-hand start (ISO 13851)';
  const STOPS_ON_LETTING_GO = '1A1 stops when a hand lets go (ISO 13851)';
  const hands = [
    { tag: '1S1', kind: 'button' },
    { tag: '1S2', kind: 'button' },
  ];
  const proofBody = { revisionNumber: 1, rulesText: twoHand.text, variations: hands, quantumS: 0.5, steps: 5, settleS: 1 };

  beforeAll(async () => {
    ws = await createTestWorkspace('proofs');
    circuitId = (await createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.engineer.id, input: { title: 'Lid press, AND valve only', description: '', message: '', document } })).id;
    worker = await startProofWorker({ threads: 1 });
  });

  afterAll(async () => {
    await worker?.stop();
  });

  const start = (body: object, userId = ws.users.engineer.id) => callRoute<{ id: string } & ErrorJson>(circuitProofs.POST, `/api/circuits/${circuitId}/proofs`, { userId, method: 'POST', body, id: circuitId });
  const read = (id: string) => callRoute<ProofDetail & ErrorJson>(proofOne.GET, `/api/proofs/${id}`, { userId: ws.users.viewer.id, id });
  const cancel = (id: string, userId = ws.users.reviewer.id) => callRoute<ProofDetail & ErrorJson>(proofCancel.POST, `/api/proofs/${id}/cancel`, { userId, method: 'POST', id });

  async function until(id: string, done: (proof: ProofDetail) => boolean, timeoutMs = 60_000): Promise<ProofDetail> {
    const deadline = Date.now() + timeoutMs;
    for (;;) {
      const { json } = await read(id);
      if (done(json)) return json;
      if (Date.now() > deadline) throw new Error(`proof ${id} still ${json.status} after ${timeoutMs} ms`);
      await new Promise((r) => setTimeout(r, 200));
    }
  }

  it('proves the two-hand rules on the AND-valve press: the late second hand is the shortest counterexample, kept as a run', async () => {
    const started = await start(proofBody);
    expect(started.status).toBe(202);
    const id = started.json.id;
    expect(['queued', 'running']).toContain((await Proof.findByPk(id, { rejectOnEmpty: true })).status);

    const proof = await until(id, (p) => FINISHED.includes(p.status));
    expect(proof.status).toBe('succeeded');
    expect(proof.error).toBeNull();
    expect(proof.startedAt).not.toBeNull();
    expect(proof.finishedAt).not.toBeNull();
    const result = proof.result!;
    expect(result.complete).toBe(true);
    expect(result.levels).toBe(5);
    expect(proof.progress).toMatchObject({ levels: 5, done: result.sequences, total: result.sequences, estimateS: 0 });
    expect(proof.outcome).toEqual({ passed: 1, failed: 1, complete: true });

    const kept = result.rules.find((r) => r.name === STOPS_ON_LETTING_GO)!;
    expect(kept).toMatchObject({ status: 'passed', counterexample: null, line: 5 });
    const broken = result.rules.find((r) => r.name === STARTS_ONLY_ON_TWO_HANDS)!;
    expect(broken).toMatchObject({ status: 'failed', line: 2 });
    const example = broken.counterexample!;
    const presses = example.inputs.filter((i: InputEvent) => i.action === 'press');
    expect(example.inputs).toHaveLength(2);
    expect(presses.map((p) => p.component).sort()).toEqual(['1S1', '1S2']);
    // One hand, then the other no sooner than the synchronous window allows (ISO 13851): the
    // search steps in 0.5 s quanta, so the shortest such path presses the second hand 0.5 s late.
    const gap = Math.abs(presses[1]!.t - presses[0]!.t);
    expect(gap).toBeGreaterThanOrEqual(SYNCHRONOUS_S);
    expect(example.violatedAtS).toBeGreaterThan(Math.max(presses[0]!.t, presses[1]!.t));
    expect(example.explanation).toContain('1A1');

    const run = await Run.findByPk(example.runId!, { rejectOnEmpty: true });
    expect({ kind: run.kind, proofId: run.proofId, name: run.name, inputs: run.inputs }).toEqual({ kind: 'proof', proofId: id, name: STARTS_ONLY_ON_TWO_HANDS, inputs: example.inputs });
    expect(run.summary).toMatchObject({ untilS: example.untilS, verdict: { rule: STARTS_ONLY_ON_TWO_HANDS, line: 2, violatedAtS: example.violatedAtS, explanation: example.explanation } });
    expect(await Run.count({ where: { proofId: id } })).toBe(1);

    const stored = JSON.parse(gunzipSync(Buffer.from(await new Response(await getObject(run.traceKey!)).arrayBuffer())).toString('utf8')) as Trace;
    const detail = await callRoute<{ name: string; untilS: number; inputs: InputEvent[] }>(runOne.GET, `/api/runs/${run.id}`, { userId: ws.users.viewer.id, id: run.id });
    expect(detail.json).toMatchObject({ name: STARTS_ONLY_ON_TWO_HANDS, untilS: example.untilS, inputs: example.inputs });
    const trace = await callRoute<Trace>(runTrace.GET, `/api/runs/${run.id}/trace`, { userId: ws.users.viewer.id, id: run.id });
    expect(trace.json).toEqual(stored);
    // The replayed trace shows the press moving out after the violation the search found.
    const x = stored.signals.find((s) => s.name.endsWith(':x') && s.unit === 'm')!;
    expect(x.values[x.values.length - 1]!).toBeGreaterThan(x.values[0]! + 0.01);

    const page = await callRoute<ProofPage>(circuitProofs.GET, `/api/circuits/${circuitId}/proofs?pageSize=5`, { userId: ws.users.viewer.id, id: circuitId });
    expect(page.json).toMatchObject({ page: 1, pageSize: 5 });
    expect(page.json.items[0]).toMatchObject({ id, status: 'succeeded', revisionNumber: 1, outcome: { passed: 1, failed: 1, complete: true } });
    expect(await AuditEvent.count({ where: { action: 'proof.started', targetId: id } })).toBe(1);

    const again = await cancel(id);
    expect(again.status).toBe(409);
    expect(again.json.error).toMatchObject({ code: 'conflict:proof' });
  });

  it('stops a running search when the proof is cancelled and keeps what it found so far', async () => {
    // Fine quanta, a loss of air and a long settle: far more paths than finish in a moment.
    const long = { ...proofBody, rulesText: twoHand.text.split('\n').slice(3).join('\n'), variations: [...hands, { tag: '0Z1', kind: 'supply-loss' }], quantumS: 0.05, steps: 12, settleS: 5 };
    const started = await start(long);
    expect(started.status).toBe(202);
    const id = started.json.id;
    await until(id, (p) => p.status === 'running' && p.progress !== null);

    const cancelled = await cancel(id);
    expect(cancelled.status).toBe(200);
    expect(cancelled.json.status).toBe('cancelled');
    expect(cancelled.json.finishedAt).not.toBeNull();

    const settled = await until(id, (p) => p.result !== null);
    expect(settled.status).toBe('cancelled');
    expect(settled.result!.complete).toBe(false);
    expect(settled.result!.levels).toBeLessThan(12);
    expect(await Run.count({ where: { proofId: id } })).toBe(0);
    expect((await cancel(id)).status).toBe(409);
  });

  it('cancels a proof no worker has taken yet, and the worker then leaves it alone', async () => {
    await worker.stop();
    const started = await start(proofBody, ws.users.owner.id);
    const cancelled = await cancel(started.json.id, ws.users.engineer.id);
    expect(cancelled.json).toMatchObject({ status: 'cancelled', startedAt: null, progress: null });
    worker = await startProofWorker({ threads: 1 });
    const queued = await start(proofBody);
    // The worker takes jobs in order: once the later proof is done, the cancelled one was passed over.
    expect((await until(queued.json.id, (p) => FINISHED.includes(p.status))).status).toBe('succeeded');
    expect((await read(started.json.id)).json).toMatchObject({ status: 'cancelled', startedAt: null, result: null });
  });

  it('refuses viewers and technicians, and bad input with the field at fault, leaving no proof', async () => {
    const before = await Proof.count();
    for (const role of ['viewer', 'technician'] as const) {
      const refused = await start(proofBody, ws.users[role].id);
      expect(refused.status).toBe(403);
      expect(refused.json.error.code).toBe('forbidden:proof');
    }
    const refusals: Array<[object, number, { code: string; field: string }]> = [
      [{ ...proofBody, quantumS: 3 }, 400, { code: 'invalid:quantumS', field: 'quantumS' }],
      [{ ...proofBody, quantumS: 0.01 }, 400, { code: 'invalid:quantumS', field: 'quantumS' }],
      [{ ...proofBody, steps: 13 }, 400, { code: 'invalid:steps', field: 'steps' }],
      [{ ...proofBody, steps: 2.5 }, 400, { code: 'invalid:steps', field: 'steps' }],
      [{ ...proofBody, settleS: 6 }, 400, { code: 'invalid:settleS', field: 'settleS' }],
      [{ ...proofBody, variations: [] }, 400, { code: 'invalid:variations', field: 'variations' }],
      [{ ...proofBody, variations: [{ tag: '1S1', kind: 'wiggle' }] }, 400, { code: 'invalid:variations.0.kind', field: 'variations.0.kind' }],
      [{ ...proofBody, variations: [hands[0], hands[0]] }, 400, { code: 'invalid:variations.1', field: 'variations.1' }],
      [{ ...proofBody, variations: [hands[0], { tag: '1V1', kind: 'button' }] }, 400, { code: 'invalid:variations.1.tag', field: 'variations.1.tag' }],
      [{ ...proofBody, variations: [{ tag: '9S9', kind: 'button' }] }, 400, { code: 'invalid:variations.0.tag', field: 'variations.0.tag' }],
      [{ ...proofBody, variations: [{ tag: '1S1', kind: 'supply-loss' }] }, 400, { code: 'invalid:variations.0.kind', field: 'variations.0.kind' }],
      [{ ...proofBody, rulesText: '  ' }, 400, { code: 'invalid:rulesText', field: 'rulesText' }],
      [{ ...proofBody, rulesText: '# only a comment' }, 400, { code: 'invalid:rulesText', field: 'rulesText' }],
      [{ ...proofBody, revisionNumber: 4 }, 404, { code: 'not_found:revision', field: 'revisionNumber' }],
    ];
    for (const [body, status, error] of refusals) {
      const refused = await start(body);
      expect(refused.status, JSON.stringify(body)).toBe(status);
      expect(refused.json.error).toMatchObject(error);
    }
    const kind = await start({ ...proofBody, variations: [{ tag: '1S1', kind: 'supply-loss' }] });
    expect(kind.json.error.message).toContain('it can: button');

    const unbound = await start({ ...proofBody, rulesText: 'rule "w":\n  always 1A1 is wobbly' });
    expect(unbound.json.error.message).toMatch(/^rulesText: line 2, column \d+: /);
    expect(unbound.json.error.errors).toHaveLength(1);
    expect(await Proof.count()).toBe(before);

    const other = await createTestWorkspace('proofs-other');
    const foreign = await callRoute<ErrorJson>(circuitProofs.POST, `/api/circuits/${circuitId}/proofs`, { userId: other.users.owner.id, method: 'POST', body: proofBody, id: circuitId });
    expect(foreign.status).toBe(404);
  });
});
