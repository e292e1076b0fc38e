import { createHash, randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import * as logFile from '@/app/api/logs/[id]/file/route';
import * as logOne from '@/app/api/logs/[id]/route';
import type { UploadDetail } from '@/lib/replays/log-detail';
import { getObject } from '@/lib/storage/object-store';
import { demoLogKey } from '@/lib/uploads/demo-logs';
import { Upload } from '@/models';
import { callRoute } from '../call-route';
import { apiRequest, createTestWorkspace, type TestWorkspace } from '../fixtures';
import { createRelayPress, DEMO_LOG, demoLogBytes, type ErrorJson } from './helpers';

/** The seed writes demo log rows before storage runs; the bytes are put there on first read. */
describe('seeded demo logs in storage', () => {
  let ws: TestWorkspace;
  let circuitId: string;

  beforeAll(async () => {
    ws = await createTestWorkspace('demo-logs');
    circuitId = await createRelayPress(ws);
  });

  const seededRow = (sha256: string, sizeBytes: number) => {
    const id = randomUUID();
    return Upload.create({ id, workspaceId: ws.workspaceId, circuitId, uploadedById: ws.users.technician.id, fileName: DEMO_LOG.file, contentType: 'text/csv', sizeBytes, sha256, storageKey: demoLogKey(id, sha256) });
  };

  it('puts the demo file in storage on first read and serves it byte for byte', async () => {
    const bytes = demoLogBytes();
    const sha256 = createHash('sha256').update(bytes).digest('hex');
    const upload = await seededRow(sha256, bytes.byteLength);
    await expect(getObject(upload.storageKey)).rejects.toMatchObject({ code: 'not_found:object' });

    const detail = await callRoute<UploadDetail>(logOne.GET, `/api/logs/${upload.id}`, { userId: ws.users.viewer.id, id: upload.id });
    expect(detail.status).toBe(200);
    expect(detail.json.preview!.columns).toContain('1B2_down');
    const stored = Buffer.from(await new Response(await getObject(upload.storageKey)).arrayBuffer());
    expect(stored.equals(bytes)).toBe(true);

    const response = await logFile.GET(await apiRequest(`/api/logs/${upload.id}/file`, { userId: ws.users.viewer.id }), { params: Promise.resolve({ id: upload.id }) });
    expect(Buffer.from(await response.arrayBuffer()).equals(bytes)).toBe(true);
  });

  it('restores nothing for a demo key whose hash no demo file has', async () => {
    const upload = await seededRow('ab'.repeat(32), 10);
    const answer = await callRoute<ErrorJson>(logOne.GET, `/api/logs/${upload.id}`, { userId: ws.users.viewer.id, id: upload.id });
    expect(answer.status).toBe(404);
    expect(answer.json.error.code).toBe('not_found:object');
  });
});
