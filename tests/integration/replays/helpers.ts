import { readFileSync } from 'node:fs';
import * as circuitLogs from '@/app/api/circuits/[id]/logs/route';
import { DEMO_LOGS } from '@/demo/plant';
import { circuitDocumentSchema, type CircuitDocument } from '@/engine/document/schema';
import { createCircuit } from '@/lib/circuits/create-circuit';
import { apiRequest, type TestWorkspace } from '../fixtures';

export interface ErrorJson {
  error: { code: string; message: string; field?: string; errors?: Array<{ row: number; column: string | null; message: string }> };
}

export const DEMO_LOG = DEMO_LOGS[0]!;
export const demoLogBytes = (): Buffer => readFileSync(`demo/logs/${DEMO_LOG.file}`);

export function relayPress(): CircuitDocument {
  return circuitDocumentSchema.parse(JSON.parse(readFileSync('demo/circuits/lid-press-relay-control.json', 'utf8')));
}

/** A copy of the demo relay-control lid press in the workspace; its id. */
export async function createRelayPress(ws: TestWorkspace, title = 'Lid press, relay control'): Promise<string> {
  return (await createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.engineer.id, input: { title, description: '', message: '', document: relayPress() } })).id;
}

/** Posts raw bytes to the upload route as the browser's upload does. */
export async function postLog<T = unknown>(
  circuitId: string,
  { userId, body, fileName, contentType = 'application/octet-stream', nameInQuery = false }: { userId: string; body: string | Uint8Array; fileName: string; contentType?: string; nameInQuery?: boolean },
): Promise<{ status: number; json: T }> {
  const path = `/api/circuits/${circuitId}/logs${nameInQuery ? `?name=${encodeURIComponent(fileName)}` : ''}`;
  const request = await apiRequest(path, { userId, method: 'POST', headers: { 'content-type': contentType, ...(nameInQuery ? {} : { 'x-file-name': encodeURIComponent(fileName) }) } });
  // apiRequest sends strings; a log is bytes, so the request is rebuilt with them.
  const raw = new Request(request.url, { method: 'POST', headers: request.headers, body: typeof body === 'string' ? body : Buffer.from(body) });
  const { NextRequest } = await import('next/server');
  const response = await circuitLogs.POST(new NextRequest(raw), { params: Promise.resolve({ id: circuitId }) });
  return { status: response.status, json: (await response.json()) as T };
}
