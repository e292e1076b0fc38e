import { beforeAll, describe, expect, it } from 'vitest';
import * as circuitMappings from '@/app/api/circuits/[id]/log-mappings/route';
import * as logMapping from '@/app/api/logs/[id]/mapping/route';
import * as logOne from '@/app/api/logs/[id]/route';
import { MAX_REPORTED_ERRORS, type ColumnMapping } from '@/lib/field-logs';
import type { UploadDetail } from '@/lib/replays/log-detail';
import type { SavedMapping } from '@/lib/replays/mappings';
import type { UploadSummary } from '@/lib/uploads/uploads';
import { LogMapping } from '@/models';
import { callRoute } from '../call-route';
import { createTestWorkspace, type TestWorkspace } from '../fixtures';
import { createRelayPress, DEMO_LOG, demoLogBytes, postLog, type ErrorJson } from './helpers';

describe('log mappings', () => {
  let ws: TestWorkspace;
  let circuitId: string;
  let logId: string;

  beforeAll(async () => {
    ws = await createTestWorkspace('mappings');
    circuitId = await createRelayPress(ws);
    logId = (await postLog<UploadSummary>(circuitId, { userId: ws.users.technician.id, body: demoLogBytes(), fileName: DEMO_LOG.file })).json.id;
  });

  const put = (body: object, id = logId, userId = ws.users.technician.id) => callRoute<SavedMapping & ErrorJson>(logMapping.PUT, `/api/logs/${id}/mapping`, { userId, method: 'PUT', body, id });
  const withColumn = (i: number, change: Partial<ColumnMapping['columns'][number]>): ColumnMapping => ({
    ...DEMO_LOG.mapping,
    columns: DEMO_LOG.mapping.columns.map((c, k) => (k === i ? { ...c, ...change } : c)),
  });

  it('refuses a column the log does not have, a tag the drawing does not have and a word its tag does not know, naming the field; nothing is stored', async () => {
    const noColumn = await put({ name: 'x', mapping: withColumn(2, { column: 'valve_1M1' }), revision: 0 });
    expect(noColumn.status).toBe(400);
    expect(noColumn.json.error).toMatchObject({ code: 'invalid:mapping.columns.2.column', field: 'mapping.columns.2.column' });

    const noTag = await put({ name: 'x', mapping: withColumn(3, { tag: '9B9' }), revision: 0 });
    expect(noTag.status).toBe(400);
    expect(noTag.json.error.field).toBe('mapping.columns.3.tag');
    expect(noTag.json.error.message).toContain('9B9');

    const noWord = await put({ name: 'x', mapping: withColumn(4, { word: 'pressure:Z' }), revision: 0 });
    expect(noWord.status).toBe(400);
    expect(noWord.json.error.field).toBe('mapping.columns.4.word');
    expect(noWord.json.error.message).toMatch(/pressure:A/);
    expect(await LogMapping.count({ where: { circuitId } })).toBe(0);
  });

  it('applies the mapping to the whole file: a column that does not read in some rows is 400 with every row in errors, and nothing is stored', async () => {
    // 1B2_down read as a pressure in Pa absolute would be below vacuum nowhere; read as a state the
    // pressure column's decimal commas ('5,8') are not states, on every row where it is not 0 or 1.
    const mapping = withColumn(4, { tag: '1B2', word: 'actuated', unit: undefined });
    const answer = await put({ name: 'x', mapping, revision: 0 });
    expect(answer.status).toBe(400);
    expect(answer.json.error.code).toBe('invalid:mapping');
    // Every problem is listed up to MAX_REPORTED_ERRORS, then one line sums up the rest.
    const errors = answer.json.error.errors!;
    const rows = errors.filter((e) => e.column !== null);
    expect(rows.length).toBe(MAX_REPORTED_ERRORS);
    expect(rows.every((e) => e.column === 'p_cap_bar')).toBe(true);
    expect(new Set(rows.map((e) => e.row)).size).toBe(rows.length);
    expect(errors.at(-1)!.message).toMatch(/^and \d+ more problems/);
    expect(await LogMapping.count({ where: { circuitId } })).toBe(0);
  });

  it('saves a mapping, shows it with the log, and counts saves so a stale one is a conflict', async () => {
    const first = await put({ name: 'Logger channels', mapping: DEMO_LOG.mapping, revision: 0 });
    expect(first.status).toBe(200);
    expect(first.json).toMatchObject({ circuitId, uploadId: logId, name: 'Logger channels', revision: 1, mapping: DEMO_LOG.mapping, updatedBy: { id: ws.users.technician.id } });

    const detail = await callRoute<UploadDetail>(logOne.GET, `/api/logs/${logId}`, { userId: ws.users.viewer.id, id: logId });
    expect(detail.json.mapping).toMatchObject({ id: first.json.id, revision: 1 });
    expect(detail.json.columnsSignature).toBe(first.json.columnsSignature);
    // 1201 rows 10 ms apart.
    expect(detail.json.durationS).toBeCloseTo(12, 6);

    const stale = await put({ name: 'Renamed', mapping: DEMO_LOG.mapping, revision: 0 }, logId, ws.users.reviewer.id);
    expect(stale.status).toBe(409);
    expect(stale.json.error).toMatchObject({ code: 'conflict:mapping', field: 'revision' });
    const second = await put({ name: 'Renamed', mapping: DEMO_LOG.mapping, revision: 1 }, logId, ws.users.reviewer.id);
    expect(second.json).toMatchObject({ id: first.json.id, name: 'Renamed', revision: 2 });

    const viewer = await put({ name: 'x', mapping: DEMO_LOG.mapping, revision: 2 }, logId, ws.users.viewer.id);
    expect(viewer.status).toBe(403);
  });

  it('offers the saved mapping for a new log with the same columns, and keeps it when its log is deleted', async () => {
    const { json: again } = await postLog<UploadSummary>(circuitId, { userId: ws.users.technician.id, body: demoLogBytes(), fileName: 'next-shift.csv' });
    const detail = await callRoute<UploadDetail>(logOne.GET, `/api/logs/${again.id}`, { userId: ws.users.viewer.id, id: again.id });
    const list = await callRoute<{ items: SavedMapping[] }>(circuitMappings.GET, `/api/circuits/${circuitId}/log-mappings`, { userId: ws.users.viewer.id, id: circuitId });
    expect(list.status).toBe(200);
    expect(list.json.items.filter((m) => m.columnsSignature === detail.json.columnsSignature).map((m) => m.name)).toEqual(['Renamed']);
    expect(detail.json.mapping).toBeNull();
    expect(detail.json.reusableMappings.map((m) => ({ name: m.name, uploadId: m.uploadId }))).toEqual([{ name: 'Renamed', uploadId: logId }]);
    // A log with other columns is offered none.
    const { json: other } = await postLog<UploadSummary>(circuitId, { userId: ws.users.technician.id, body: 't;1B2\n0;0\n', fileName: 'other.csv' });
    const otherDetail = await callRoute<UploadDetail>(logOne.GET, `/api/logs/${other.id}`, { userId: ws.users.viewer.id, id: other.id });
    expect(otherDetail.json.reusableMappings).toEqual([]);

    await callRoute(logOne.DELETE, `/api/logs/${logId}`, { userId: ws.users.technician.id, method: 'DELETE', id: logId });
    const after = await callRoute<{ items: SavedMapping[] }>(circuitMappings.GET, `/api/circuits/${circuitId}/log-mappings`, { userId: ws.users.viewer.id, id: circuitId });
    expect(after.json.items).toHaveLength(1);
    expect(after.json.items[0]).toMatchObject({ name: 'Renamed', uploadId: null });
  });
});
