import { gunzipSync } from 'node:zlib';
import { beforeAll, describe, expect, it } from 'vitest';
import * as circuitRuns from '@/app/api/circuits/[id]/runs/route';
import * as runOne from '@/app/api/runs/[id]/route';
import * as runTrace from '@/app/api/runs/[id]/trace/route';
import { compile } from '@/engine/solver/compile';
import { simulate } from '@/engine/solver/simulate';
import type { Trace } from '@/engine/trace/trace';
import { appendRevision } from '@/lib/circuits/append-revision';
import { createCircuit } from '@/lib/circuits/create-circuit';
import { getObject } from '@/lib/storage/object-store';
import { Circuit, Run, User } from '@/models';
import { callRoute, lidPress } from '../call-route';
import { createTestWorkspace, type TestWorkspace } from '../fixtures';

interface ErrorJson {
  error: { code: string; message: string; field?: string };
}

describe('saved runs', () => {
  let ws: TestWorkspace;
  let circuitId: string;
  const { document, inputs } = lidPress();

  beforeAll(async () => {
    ws = await createTestWorkspace('runs');
    circuitId = (await createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.engineer.id, input: { title: 'Lid press cell 3', description: '', message: '', document } })).id;
  });

  const save = (body: object, userId = ws.users.technician.id) => callRoute<{ id: string } & ErrorJson>(circuitRuns.POST, `/api/circuits/${circuitId}/runs`, { userId, method: 'POST', body, id: circuitId });
  const runCount = () => Run.count({ include: [{ association: 'revision', where: { circuitId } }] });

  it('stores the trace of a live run and reads it back: the rows of a fresh simulate with the same inputs', async () => {
    const saved = await save({ revisionNumber: 1, inputs, untilS: 3, name: '  Both hands, late release ' });
    expect(saved.status).toBe(201);
    const id = saved.json.id;

    const row = await Run.findByPk(id, { rejectOnEmpty: true });
    expect({ kind: row.kind, status: row.status, name: row.name, traceKey: row.traceKey, inputs: row.inputs }).toEqual({ kind: 'live', status: 'succeeded', name: 'Both hands, late release', traceKey: `runs/${id}.json.gz`, inputs });
    expect(row.summary).toMatchObject({ untilS: 3, intervalS: 0.01, signalCount: 42, rowCount: 301 });

    const technician = await User.findByPk(ws.users.technician.id, { rejectOnEmpty: true });
    const detail = await callRoute(runOne.GET, `/api/runs/${id}`, { userId: ws.users.viewer.id, id });
    expect(detail).toEqual({
      status: 200,
      json: { id, revisionNumber: 1, circuitId, name: 'Both hands, late release', kind: 'live', untilS: 3, inputs, summary: row.summary, createdAt: row.createdAt.toISOString(), createdBy: { id: technician.id, name: technician.name } },
    });

    const read = await callRoute<Trace>(runTrace.GET, `/api/runs/${id}/trace`, { userId: ws.users.viewer.id, id });
    expect(read.status).toBe(200);
    // The editor's live run goes towards a ten-minute horizon; its rows up to 3 s are the saved ones.
    const fresh = simulate(compile(document).model!, inputs, { untilS: 600, intervalS: 0.01 });
    const rows = 301;
    expect(read.json.formatVersion).toBe(1);
    expect(read.json.intervalS).toBe(0.01);
    expect(read.json.time).toEqual(fresh.time.slice(0, rows));
    expect(read.json.signals).toEqual(fresh.signals.map((s) => ({ ...s, values: s.values.slice(0, rows) })));
    expect(read.json.events).toEqual(fresh.events.filter((e) => e.t <= 3));
    expect(read.json.events.length).toBeGreaterThan(0);

    const stored = Buffer.from(await new Response(await getObject(`runs/${id}.json.gz`)).arrayBuffer());
    expect([...stored.subarray(0, 2)]).toEqual([0x1f, 0x8b]);
    expect(JSON.parse(gunzipSync(stored).toString('utf8'))).toEqual(read.json);
  });

  it("lists a circuit's saved runs newest first", async () => {
    const first = await save({ revisionNumber: 1, inputs: inputs.slice(0, 1), untilS: 0.5 });
    const second = await save({ revisionNumber: 1, inputs: [], untilS: 0.25 }, ws.users.reviewer.id);
    const { status, json } = await callRoute<{ items: Array<{ id: string }> }>(circuitRuns.GET, `/api/circuits/${circuitId}/runs`, { userId: ws.users.viewer.id, id: circuitId });
    expect(status).toBe(200);
    const reviewer = await User.findByPk(ws.users.reviewer.id, { rejectOnEmpty: true });
    expect(json.items.slice(0, 2)).toEqual([
      { id: second.json.id, revisionNumber: 1, name: null, untilS: 0.25, createdAt: expect.stringMatching(/^\d{4}-/), createdBy: { id: reviewer.id, name: reviewer.name } },
      expect.objectContaining({ id: first.json.id, untilS: 0.5 }),
    ]);
  });

  it('refuses invalid inputs and a drawing with errors, and leaves no run behind', async () => {
    const before = await runCount();
    const refusals: Array<[object, number, { code: string; field: string; message?: string }]> = [
      [{ revisionNumber: 1, inputs, untilS: 2 }, 400, { code: 'invalid:inputs.2.t', field: 'inputs.2.t', message: 'inputs.2.t: after the end of the run (2 s)' }],
      [{ revisionNumber: 1, inputs: [], untilS: 0 }, 400, { code: 'invalid:untilS', field: 'untilS', message: 'untilS: must be more than 0 s' }],
      [{ revisionNumber: 1, inputs: [], untilS: 600.5 }, 400, { code: 'invalid:untilS', field: 'untilS', message: 'untilS: at most 600 s' }],
      [{ revisionNumber: 1, inputs: Array.from({ length: 10_001 }, () => ({ t: 0, component: '1S1', action: 'press' })), untilS: 1 }, 400, { code: 'invalid:inputs', field: 'inputs', message: 'inputs: at most 10 000 inputs' }],
      [{ revisionNumber: 1, inputs: [{ t: -1, component: '1S1', action: 'press' }], untilS: 1 }, 400, { code: 'invalid:inputs.0.t', field: 'inputs.0.t' }],
      [{ revisionNumber: 1, inputs: [{ t: 0.1, component: '1S1', action: 'kick' }], untilS: 1 }, 400, { code: 'invalid:inputs.0.action', field: 'inputs.0.action' }],
      [{ revisionNumber: 7, inputs: [], untilS: 1 }, 404, { code: 'not_found:revision', field: 'revisionNumber' }],
    ];
    for (const [body, status, error] of refusals) {
      const refused = await save(body);
      expect(refused.status, JSON.stringify(error)).toBe(status);
      expect(refused.json.error).toMatchObject(error);
    }

    const broken = { ...document, tubes: [...document.tubes, { id: 'loose', from: { component: 'press', port: '9' }, to: { component: 'main', port: '4' }, lengthM: 0.5, innerDiameterM: 0.004, bends: [] }] };
    const { lockVersion } = await Circuit.findByPk(circuitId, { rejectOnEmpty: true });
    const revision = await appendRevision({ workspaceId: ws.workspaceId, circuitId, authorId: ws.users.engineer.id, document: broken, message: 'Tube to a port the press lacks', expectedLockVersion: lockVersion });
    const refused = await save({ revisionNumber: revision.number, inputs, untilS: 3 });
    expect(refused.status).toBe(400);
    expect(refused.json.error).toEqual({ code: 'invalid:revisionNumber', field: 'revisionNumber', message: "This revision's drawing has errors, so it cannot run: Tube loose ends at press:9, which does not exist" });

    expect(await runCount()).toBe(before);
  });

  it('refuses a viewer, who may read runs but not make them', async () => {
    const refused = await save({ revisionNumber: 1, inputs: [], untilS: 1 }, ws.users.viewer.id);
    expect(refused.status).toBe(403);
    expect(refused.json.error.code).toBe('forbidden:circuit');
  });
});
