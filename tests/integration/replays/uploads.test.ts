import { createHash } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import * as circuitLogs from '@/app/api/circuits/[id]/logs/route';
import * as logFile from '@/app/api/logs/[id]/file/route';
import * as logOne from '@/app/api/logs/[id]/route';
import { MAX_LOG_BYTES } from '@/lib/field-logs';
import type { UploadDetail } from '@/lib/replays/log-detail';
import { getObject } from '@/lib/storage/object-store';
import type { UploadPage, UploadSummary } from '@/lib/uploads/uploads';
import { AuditEvent, Upload } from '@/models';
import { callRoute } from '../call-route';
import { apiRequest, createTestWorkspace, type TestWorkspace } from '../fixtures';
import { createRelayPress, demoLogBytes, postLog, type ErrorJson } from './helpers';

const sha256 = (bytes: Uint8Array) => createHash('sha256').update(bytes).digest('hex');

describe('field log uploads', () => {
  let ws: TestWorkspace;
  let circuitId: string;

  beforeAll(async () => {
    ws = await createTestWorkspace('logs');
    circuitId = await createRelayPress(ws);
  });

  it('keeps a log with the SHA-256 of its bytes computed on the server, under logs/<id> as opaque bytes', async () => {
    const bytes = demoLogBytes();
    const answer = await postLog<UploadSummary>(circuitId, { userId: ws.users.technician.id, body: bytes, fileName: 'Presse LP-2 — Nov.csv', contentType: 'text/csv' });
    expect(answer.status).toBe(201);
    expect(answer.json).toMatchObject({ circuitId, fileName: 'Presse LP-2 — Nov.csv', contentType: 'text/csv', sizeBytes: bytes.byteLength, sha256: sha256(bytes), uploadedBy: { id: ws.users.technician.id } });

    const row = await Upload.findByPk(answer.json.id, { rejectOnEmpty: true });
    expect(row.storageKey).toBe(`logs/${row.id}`);
    expect(row.sha256).toBe(sha256(bytes));
    const stored = Buffer.from(await new Response(await getObject(row.storageKey)).arrayBuffer());
    expect(sha256(stored)).toBe(row.sha256);
    expect(await AuditEvent.count({ where: { action: 'log.uploaded', targetId: row.id } })).toBe(1);
  });

  it('takes the name from the query when there is no header, and the last path segment only', async () => {
    const answer = await postLog<UploadSummary>(circuitId, { userId: ws.users.engineer.id, body: 't;1S1\n0;0\n', fileName: 'C:\\logs\\short.csv', nameInQuery: true });
    expect(answer.status).toBe(201);
    expect(answer.json.fileName).toBe('short.csv');
  });

  it('refuses a log over MAX_LOG_BYTES with 413 and keeps nothing', async () => {
    const before = await Upload.count({ where: { circuitId } });
    const big = new Uint8Array(MAX_LOG_BYTES + 1).fill(0x30);
    const answer = await postLog<ErrorJson>(circuitId, { userId: ws.users.technician.id, body: big, fileName: 'huge.csv' });
    expect(answer.status).toBe(413);
    expect(answer.json.error.code).toBe('too_large:log');
    expect(await Upload.count({ where: { circuitId } })).toBe(before);
  });

  it('refuses other file types by name and by content, and other media types', async () => {
    const exe = await postLog<ErrorJson>(circuitId, { userId: ws.users.technician.id, body: 'MZ', fileName: 'logger.exe' });
    expect(exe.status).toBe(400);
    expect(exe.json.error).toMatchObject({ code: 'invalid:file', field: 'fileName' });

    const binary = await postLog<ErrorJson>(circuitId, { userId: ws.users.technician.id, body: new Uint8Array([0x74, 0x3b, 0x61, 0x0a, 0x00, 0x01]), fileName: 'binary.csv' });
    expect(binary.status).toBe(400);
    expect(binary.json.error.code).toBe('invalid:file');
    expect(binary.json.error.message).toMatch(/NUL/);

    const renamed = await postLog<ErrorJson>(circuitId, { userId: ws.users.technician.id, body: '{"t":0,"1S1":1}\n', fileName: 'lines.csv' });
    expect(renamed.status).toBe(400);
    expect(renamed.json.error.message).toMatch(/JSON lines/);

    const html = await postLog<ErrorJson>(circuitId, { userId: ws.users.technician.id, body: 't;1S1\n0;0\n', fileName: 'ok.csv', contentType: 'text/html' });
    expect(html.status).toBe(400);
    expect(html.json.error.code).toBe('invalid:content_type');
  });

  it('lists the logs newest first, paged', async () => {
    const page = await callRoute<UploadPage>(circuitLogs.GET, `/api/circuits/${circuitId}/logs?pageSize=1`, { userId: ws.users.viewer.id, id: circuitId });
    expect(page.status).toBe(200);
    expect(page.json).toMatchObject({ page: 1, pageSize: 1, total: 2 });
    expect(page.json.items.map((i) => i.fileName)).toEqual(['short.csv']);
    const second = await callRoute<UploadPage>(circuitLogs.GET, `/api/circuits/${circuitId}/logs?pageSize=1&page=2`, { userId: ws.users.viewer.id, id: circuitId });
    expect(second.json.items.map((i) => i.fileName)).toEqual(['Presse LP-2 — Nov.csv']);
  });

  it('hands a log back only as a download that is never rendered, byte for byte', async () => {
    const html = '<script>alert(1)</script>;x\n0;1\n';
    const { json: upload } = await postLog<UploadSummary>(circuitId, { userId: ws.users.technician.id, body: html, fileName: 'page "x".txt' });
    const response = await logFile.GET(await apiRequest(`/api/logs/${upload.id}/file`, { userId: ws.users.viewer.id }), { params: Promise.resolve({ id: upload.id }) });
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toBe('application/octet-stream');
    expect(response.headers.get('x-content-type-options')).toBe('nosniff');
    expect(response.headers.get('content-security-policy')).toBe('sandbox');
    const disposition = response.headers.get('content-disposition')!;
    expect(disposition).toMatch(/^attachment;/);
    expect(disposition).toContain(`filename*=UTF-8''page%20%22x%22.txt`);
    expect(disposition).not.toContain('"x"');
    expect(await response.text()).toBe(html);
  });

  it('previews a log: columns, first 20 rows, format and guesses; or the parse errors', async () => {
    const { json: upload } = await postLog<UploadSummary>(circuitId, { userId: ws.users.technician.id, body: demoLogBytes(), fileName: 'demo.csv' });
    const detail = await callRoute<UploadDetail>(logOne.GET, `/api/logs/${upload.id}`, { userId: ws.users.viewer.id, id: upload.id });
    expect(detail.status).toBe(200);
    const preview = detail.json.preview!;
    expect(preview.format).toBe('csv');
    expect(preview.columns).toEqual(['timestamp', 'S1_start', 'S2_stop', '1M1_valve', '1B2_down', 'p_cap_bar']);
    expect(preview.rows).toHaveLength(20);
    expect(preview.rowCount).toBeGreaterThan(1000);
    expect(preview.decimalComma).toBe(true);
    expect(preview.timeColumnGuess).toBe('timestamp');
    expect(preview.timeFormatGuess).toBe('iso8601');
    expect(preview.suggestedMapping.columns.find((c) => c.column === '1B2_down')).toMatchObject({ tag: '1B2', role: 'observation' });
    expect(detail.json).toMatchObject({ parseErrors: null, mapping: null, durationS: null });
    expect(detail.json.columnsSignature).toMatch(/^[0-9a-f]{64}$/);

    const { json: broken } = await postLog<UploadSummary>(circuitId, { userId: ws.users.technician.id, body: '{"t":0}\n{"t":\n', fileName: 'broken.jsonl' });
    const bad = await callRoute<UploadDetail>(logOne.GET, `/api/logs/${broken.id}`, { userId: ws.users.viewer.id, id: broken.id });
    expect(bad.status).toBe(200);
    expect(bad.json.preview).toBeNull();
    expect(bad.json.parseErrors![0]).toMatchObject({ row: 2 });
  });

  it('lets the uploader or an owner delete a log, not another engineer; the bytes go too', async () => {
    const { json: upload } = await postLog<UploadSummary>(circuitId, { userId: ws.users.technician.id, body: 't;a\n0;1\n', fileName: 'gone.csv' });
    const del = (userId: string) => callRoute<ErrorJson>(logOne.DELETE, `/api/logs/${upload.id}`, { userId, method: 'DELETE', id: upload.id });
    expect((await del(ws.users.engineer.id)).status).toBe(403);
    expect((await del(ws.users.viewer.id)).status).toBe(403);
    expect((await del(ws.users.technician.id)).status).toBe(200);
    expect(await Upload.findByPk(upload.id)).toBeNull();
    await expect(getObject(`logs/${upload.id}`)).rejects.toMatchObject({ code: 'not_found:object' });

    const { json: other } = await postLog<UploadSummary>(circuitId, { userId: ws.users.technician.id, body: 't;a\n0;1\n', fileName: 'gone2.csv' });
    expect((await callRoute(logOne.DELETE, `/api/logs/${other.id}`, { userId: ws.users.owner.id, method: 'DELETE', id: other.id })).status).toBe(200);
  });

  it('never admits another workspace has a log', async () => {
    const other = await createTestWorkspace('logs-other');
    const { json: upload } = await postLog<UploadSummary>(circuitId, { userId: ws.users.technician.id, body: 't;a\n0;1\n', fileName: 'mine.csv' });
    const answer = await callRoute<ErrorJson>(logOne.GET, `/api/logs/${upload.id}`, { userId: other.users.owner.id, id: upload.id });
    expect(answer.status).toBe(404);
    expect(answer.json.error.code).toBe('not_found:log');
  });
});
