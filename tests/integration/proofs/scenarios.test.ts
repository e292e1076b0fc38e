import { gunzipSync } from 'node:zlib';
import { beforeAll, describe, expect, it } from 'vitest';
import * as suiteRoute from '@/app/api/circuits/[id]/scenarios/run/route';
import * as circuitScenarios from '@/app/api/circuits/[id]/scenarios/route';
import * as runOne from '@/app/api/runs/[id]/route';
import * as scenarioRun from '@/app/api/scenarios/[id]/run/route';
import * as scenarioOne from '@/app/api/scenarios/[id]/route';
import type { Trace } from '@/engine/trace/trace';
import { appendRevision } from '@/lib/circuits/append-revision';
import { createCircuit } from '@/lib/circuits/create-circuit';
import { getObject } from '@/lib/storage/object-store';
import { Circuit, Run, Scenario } from '@/models';
import { callRoute, lidPress } from '../call-route';
import { createTestWorkspace, type TestWorkspace } from '../fixtures';

interface ErrorJson {
  error: { code: string; message: string; field?: string; errors?: Array<{ line: number; column: number; message: string }> };
}

interface ScenarioJson {
  id: string;
  name: string;
  inputs: unknown[];
  untilS: number;
  expectations: string;
  revision: number;
}

interface Verdict {
  name: string;
  line: number;
  holds: boolean;
  violatedAtS: number | null;
  explanation: string;
}

interface RunResultJson {
  scenarioId: string;
  name: string;
  runId: string;
  revisionNumber: number;
  passed: boolean;
  verdicts: Verdict[];
}

/** Holds on the demo run: both hands press within 0.15 s, so the press goes out. */
const REACHES_END = 'rule "press reaches its end": eventually 1A1 is extended';
/** Breaks on the same run: the press does move out. */
const NEVER_MOVES = 'rule "press never moves out": never 1A1 is extending';

describe('scenarios', () => {
  let ws: TestWorkspace;
  let circuitId: string;
  const { document, inputs } = lidPress();

  beforeAll(async () => {
    ws = await createTestWorkspace('scenarios');
    circuitId = (await createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.engineer.id, input: { title: 'Lid press scenarios', description: '', message: '', document } })).id;
  });

  const create = (body: object, userId = ws.users.engineer.id) =>
    callRoute<ScenarioJson & ErrorJson>(circuitScenarios.POST, `/api/circuits/${circuitId}/scenarios`, { userId, method: 'POST', body, id: circuitId });
  const list = () => callRoute<{ items: ScenarioJson[] }>(circuitScenarios.GET, `/api/circuits/${circuitId}/scenarios`, { userId: ws.users.viewer.id, id: circuitId });
  const patch = (id: string, body: object, userId = ws.users.engineer.id) => callRoute<ScenarioJson & ErrorJson>(scenarioOne.PATCH, `/api/scenarios/${id}`, { userId, method: 'PATCH', body, id });
  const remove = (id: string, userId = ws.users.engineer.id) => callRoute<{ ok: true } & ErrorJson>(scenarioOne.DELETE, `/api/scenarios/${id}`, { userId, method: 'DELETE', id });
  const run = (id: string, body?: object, userId = ws.users.technician.id) => callRoute<RunResultJson & ErrorJson>(scenarioRun.POST, `/api/scenarios/${id}/run`, { userId, method: 'POST', body, id });

  it('creates, lists, changes with the save count and deletes a scenario', async () => {
    const created = await create({ name: '  Both hands together ', inputs, untilS: 3, expectations: REACHES_END });
    expect(created.status).toBe(201);
    expect(created.json).toMatchObject({ name: 'Both hands together', inputs, untilS: 3, expectations: REACHES_END, revision: 1 });
    const id = created.json.id;

    expect((await list()).json.items.map((s) => s.id)).toContain(id);

    const renamed = await patch(id, { revision: 1, name: 'Both hands, early' });
    expect(renamed.status).toBe(200);
    expect(renamed.json).toMatchObject({ name: 'Both hands, early', inputs, expectations: REACHES_END, revision: 2 });

    const stale = await patch(id, { revision: 1, untilS: 4 });
    expect(stale.status).toBe(409);
    expect(stale.json.error).toMatchObject({ code: 'conflict:scenario', field: 'revision' });
    expect((await Scenario.findByPk(id, { rejectOnEmpty: true })).untilS).toBe(3);

    const shortened = await patch(id, { revision: 2, untilS: 1 });
    expect(shortened.status).toBe(400);
    expect(shortened.json.error.field).toBe('inputs.2.t');

    expect((await remove(id, ws.users.reviewer.id)).status).toBe(403);
    expect((await remove(id)).json).toEqual({ ok: true });
    expect(await Scenario.findByPk(id)).toBeNull();
    expect((await remove(id)).status).toBe(404);
  });

  it('refuses a taken name, expectations that do not bind, unknown parts and bad fields', async () => {
    expect((await create({ name: 'Only once', inputs: [], untilS: 1, expectations: '' })).status).toBe(201);
    const taken = await create({ name: 'ONLY ONCE', inputs: [], untilS: 1, expectations: '' });
    expect(taken.status).toBe(409);
    expect(taken.json.error).toMatchObject({ code: 'conflict:scenario', field: 'name' });

    const unbound = await create({ name: 'Wobbly', inputs: [], untilS: 1, expectations: 'rule "w":\n  always 1A1 is wobbly' });
    expect(unbound.status).toBe(400);
    expect(unbound.json.error.field).toBe('expectations');
    expect(unbound.json.error.message).toMatch(/^expectations: line 2, column \d+: /);
    expect(unbound.json.error.errors).toHaveLength(1);

    const ghost = await create({ name: 'Ghost button', inputs: [{ t: 0.1, component: '9S9', action: 'press' }], untilS: 1, expectations: '' });
    expect(ghost.status).toBe(400);
    expect(ghost.json.error).toMatchObject({ code: 'invalid:inputs.0.component', field: 'inputs.0.component' });

    const late = await create({ name: 'Late', inputs, untilS: 2, expectations: '' });
    expect(late.json.error).toMatchObject({ code: 'invalid:inputs.2.t', field: 'inputs.2.t' });
    const long = await create({ name: 'Long', inputs: [], untilS: 601, expectations: '' });
    expect(long.json.error).toMatchObject({ code: 'invalid:untilS', field: 'untilS' });
    const nameless = await create({ name: ' ', inputs: [], untilS: 1, expectations: '' });
    expect(nameless.json.error).toMatchObject({ code: 'invalid:name', field: 'name' });

    const byViewer = await create({ name: 'Viewer', inputs: [], untilS: 1, expectations: '' }, ws.users.viewer.id);
    expect(byViewer.status).toBe(403);
    expect(byViewer.json.error.code).toBe('forbidden:scenario');
  });

  it('runs a scenario: a kept run named after it with its trace, and verdicts that pass and fail', async () => {
    const good = await create({ name: 'Demo start', inputs, untilS: 3, expectations: REACHES_END });
    const ran = await run(good.json.id);
    expect(ran.status).toBe(201);
    expect(ran.json).toMatchObject({ scenarioId: good.json.id, name: 'Demo start', revisionNumber: 1, passed: true });
    expect(ran.json.verdicts).toEqual([expect.objectContaining({ name: 'press reaches its end', line: 1, holds: true, violatedAtS: null })]);

    const row = await Run.findByPk(ran.json.runId, { rejectOnEmpty: true });
    expect({ kind: row.kind, name: row.name, inputs: row.inputs }).toEqual({ kind: 'scenario', name: 'Demo start', inputs });
    expect(row.summary).toMatchObject({ untilS: 3, scenarioId: good.json.id, passed: true });
    const stored = JSON.parse(gunzipSync(Buffer.from(await new Response(await getObject(row.traceKey!)).arrayBuffer())).toString('utf8')) as Trace;
    expect(stored.time).toHaveLength(301);
    const detail = await callRoute<{ untilS: number; name: string }>(runOne.GET, `/api/runs/${row.id}`, { userId: ws.users.viewer.id, id: row.id });
    expect(detail.json).toMatchObject({ name: 'Demo start', untilS: 3 });

    const bad = await create({ name: 'Demo start, kept still', inputs, untilS: 3, expectations: `${REACHES_END}\n${NEVER_MOVES}` });
    const failed = await run(bad.json.id, { revisionNumber: 1 });
    expect(failed.json.passed).toBe(false);
    const [holds, breaks] = failed.json.verdicts;
    expect(holds).toMatchObject({ name: 'press reaches its end', holds: true });
    expect(breaks).toMatchObject({ name: 'press never moves out', line: 2, holds: false });
    // Both hands are down from 0.35 s; the press starts out after the valves switch.
    expect(breaks!.violatedAtS).toBeGreaterThan(0.35);
    expect(breaks!.violatedAtS).toBeLessThan(1);

    const viewer = await run(good.json.id, undefined, ws.users.viewer.id);
    expect(viewer.status).toBe(403);
    const missing = await run(good.json.id, { revisionNumber: 9 });
    expect(missing.json.error).toMatchObject({ code: 'not_found:revision', field: 'revisionNumber' });
  });

  it('runs the whole suite on the newest revision, reporting a scenario that no longer fits', async () => {
    const before = await list();
    const { lockVersion } = await Circuit.findByPk(circuitId, { rejectOnEmpty: true });
    // Revision 2 renames the press, so expectations naming 1A1 no longer bind.
    const renamed = { ...document, components: document.components.map((c) => (c.tag === '1A1' ? { ...c, tag: '2A1' } : c)) };
    await appendRevision({ workspaceId: ws.workspaceId, circuitId, authorId: ws.users.engineer.id, document: renamed, message: 'Press renumbered', expectedLockVersion: lockVersion });

    const suite = await callRoute<{ revisionNumber: number; passed: boolean; results: Array<RunResultJson & ErrorJson> }>(suiteRoute.POST, `/api/circuits/${circuitId}/scenarios/run`, { userId: ws.users.reviewer.id, method: 'POST', id: circuitId });
    expect(suite.status).toBe(200);
    expect(suite.json.revisionNumber).toBe(2);
    expect(suite.json.passed).toBe(false);
    expect(suite.json.results.map((r) => r.name)).toEqual(before.json.items.map((s) => s.name));
    const demo = suite.json.results.find((r) => r.name === 'Demo start')!;
    expect(demo.error).toMatchObject({ code: 'invalid:expectations', field: 'expectations' });
    const empty = suite.json.results.find((r) => r.name === 'Only once')!;
    expect(empty).toMatchObject({ passed: true, revisionNumber: 2, verdicts: [] });
    expect(await Run.findByPk(empty.runId)).not.toBeNull();
  });
});
