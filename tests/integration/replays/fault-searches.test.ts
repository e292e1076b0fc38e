import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as faultSearchCancel from '@/app/api/fault-searches/[id]/cancel/route';
import * as faultSearchOne from '@/app/api/fault-searches/[id]/route';
import * as logFaultSearches from '@/app/api/logs/[id]/fault-searches/route';
import * as logMapping from '@/app/api/logs/[id]/mapping/route';
import { startFaultWorker } from '@/lib/jobs/fault-worker';
import type { QueueWorker } from '@/lib/jobs/queue';
import type { FaultSearchDetail, FaultSearchPage } from '@/lib/replays/fault-searches';
import type { UploadSummary } from '@/lib/uploads/uploads';
import { AuditEvent, FaultSearch } from '@/models';
import { callRoute } from '../call-route';
import { createTestWorkspace, type TestWorkspace } from '../fixtures';
import { createRelayPress, DEMO_LOG, demoLogBytes, postLog, type ErrorJson } from './helpers';

const FINISHED = ['succeeded', 'failed', 'cancelled'];

describe('fault searches', () => {
  let ws: TestWorkspace;
  let logId: string;
  let worker: QueueWorker;

  beforeAll(async () => {
    ws = await createTestWorkspace('faults');
    const circuitId = await createRelayPress(ws);
    logId = (await postLog<UploadSummary>(circuitId, { userId: ws.users.technician.id, body: demoLogBytes(), fileName: DEMO_LOG.file })).json.id;
    const saved = await callRoute(logMapping.PUT, `/api/logs/${logId}/mapping`, { userId: ws.users.technician.id, method: 'PUT', body: { name: 'Logger', mapping: DEMO_LOG.mapping, revision: 0 }, id: logId });
    expect(saved.status).toBe(200);
    // One engine thread: the pool and evaluateFaultTask are what the worker process runs.
    worker = await startFaultWorker({ threads: 1 });
  });

  afterAll(async () => {
    await worker?.stop();
  });

  const start = (userId = ws.users.technician.id) => callRoute<{ id: string } & ErrorJson>(logFaultSearches.POST, `/api/logs/${logId}/fault-searches`, { userId, method: 'POST', id: logId });
  const read = (id: string) => callRoute<FaultSearchDetail & ErrorJson>(faultSearchOne.GET, `/api/fault-searches/${id}`, { userId: ws.users.viewer.id, id });
  const cancel = (id: string, userId = ws.users.reviewer.id) => callRoute<FaultSearchDetail & ErrorJson>(faultSearchCancel.POST, `/api/fault-searches/${id}/cancel`, { userId, method: 'POST', id });

  async function until(id: string, done: (search: FaultSearchDetail) => boolean, timeoutMs = 60_000, everyMs = 200): Promise<FaultSearchDetail> {
    const deadline = Date.now() + timeoutMs;
    for (;;) {
      const { json } = await read(id);
      if (done(json)) return json;
      if (Date.now() > deadline) throw new Error(`fault search ${id} still ${json.status} after ${timeoutMs} ms`);
      await new Promise((r) => setTimeout(r, everyMs));
    }
  }

  it('ranks the flow control 1V2 first for the slow-closing press, the fault the demo log was recorded with', async () => {
    const started = await start();
    expect(started.status).toBe(202);
    const search = await until(started.json.id, (s) => FINISHED.includes(s.status));
    expect(search.status).toBe('succeeded');
    expect(search.error).toBeNull();
    const result = search.result!;
    expect(result.complete).toBe(true);
    // scripts/make-demo-log.ts recorded the log with the meter-out flow control 1V2 closed too far.
    expect(result.candidates[0]).toMatchObject({ faultId: 'throttle-setting', tag: '1V2' });
    expect(result.candidates[0]!.match).toBeGreaterThan(result.baseline.match + 20);
    expect(result.candidates[0]!.improvement).toBeGreaterThan(0);
    expect(search.best).toMatchObject({ faultId: 'throttle-setting', tag: '1V2' });
    expect(search.progress).toMatchObject({ done: search.progress!.total, estimateS: 0 });
    expect(search.startedAt).not.toBeNull();
    expect(search.finishedAt).not.toBeNull();

    const page = await callRoute<FaultSearchPage>(logFaultSearches.GET, `/api/logs/${logId}/fault-searches`, { userId: ws.users.viewer.id, id: logId });
    expect(page.json.items[0]).toMatchObject({ id: search.id, status: 'succeeded', revisionNumber: 1, best: { tag: '1V2' } });
    expect(await AuditEvent.count({ where: { action: 'fault_search.started', targetId: search.id } })).toBe(1);

    const again = await cancel(search.id);
    expect(again.status).toBe(409);
    expect(again.json.error.code).toBe('conflict:fault_search');
  });

  it('stops a running search when it is cancelled and keeps what it ranked so far', async () => {
    const { json } = await start(ws.users.engineer.id);
    await until(json.id, (s) => s.status === 'running' && s.progress !== null, 30_000, 20);
    const cancelled = await cancel(json.id);
    expect(cancelled.status).toBe(200);
    expect(cancelled.json.status).toBe('cancelled');
    // The worker reads the status after each batch of simulations, so it sees the cancel a batch or
    // two later, long before the search's last batch, and writes what it has.
    const kept = await until(json.id, (s) => s.result !== null, 10_000);
    expect(kept.status).toBe('cancelled');
    expect(kept.result!.complete).toBe(false);
    expect(kept.progress!.done).toBeLessThan(kept.progress!.total);
  });

  it('lets a viewer read searches but not start or cancel one', async () => {
    expect((await start(ws.users.viewer.id)).status).toBe(403);
    const search = await FaultSearch.findOne({ where: { uploadId: logId }, rejectOnEmpty: true });
    expect((await cancel(search.id, ws.users.viewer.id)).status).toBe(403);
    expect((await read(search.id)).status).toBe(200);
  });
});
