import { requestJson, sendJson } from '@/components/api/request-json';
import type { Comparison } from '@/engine/replay';
import type { ColumnMapping } from '@/lib/field-logs';
import type { FaultSearchDetail, FaultSearchPage } from '@/lib/replays/fault-searches';
import type { UploadDetail } from '@/lib/replays/log-detail';
import type { SavedMapping } from '@/lib/replays/mappings';
import type { UploadPage, UploadSummary } from '@/lib/uploads/uploads';

// Types only: the shapes come from the server modules, so the pages and the routes cannot drift apart.
export type { FaultSearchDetail, FaultSearchSummary } from '@/lib/replays/fault-searches';
export type { UploadDetail } from '@/lib/replays/log-detail';
export type { SavedMapping } from '@/lib/replays/mappings';
export type { UploadSummary } from '@/lib/uploads/uploads';

export const logKeys = {
  logs: (circuitId: string, page: number) => ['circuits', circuitId, 'logs', page] as const,
  allLogs: (circuitId: string) => ['circuits', circuitId, 'logs'] as const,
  log: (logId: string) => ['logs', logId] as const,
  searches: (logId: string) => ['logs', logId, 'fault-searches'] as const,
  search: (searchId: string) => ['fault-searches', searchId] as const,
};

const circuitBase = (circuitId: string) => `/api/circuits/${encodeURIComponent(circuitId)}`;
const logBase = (logId: string) => `/api/logs/${encodeURIComponent(logId)}`;

export const fetchLogs = (circuitId: string, page: number, signal: AbortSignal) => requestJson<UploadPage>(`${circuitBase(circuitId)}/logs?page=${page}&pageSize=10`, signal);
export const fetchLog = (logId: string, signal: AbortSignal) => requestJson<UploadDetail>(logBase(logId), signal);
export const deleteLog = (logId: string) => sendJson<{ ok: true }>('DELETE', logBase(logId));
export const logFileUrl = (logId: string) => `${logBase(logId)}/file`;
export const saveMapping = (logId: string, body: { name: string; mapping: ColumnMapping; revision: number }) => sendJson<SavedMapping>('PUT', `${logBase(logId)}/mapping`, body);
export const replayLog = (logId: string) => sendJson<{ runId: string; comparison: Comparison }>('POST', `${logBase(logId)}/replay`);
export const fetchFaultSearches = (logId: string, signal: AbortSignal) => requestJson<FaultSearchPage>(`${logBase(logId)}/fault-searches?page=1&pageSize=5`, signal);
export const fetchFaultSearch = (searchId: string, signal: AbortSignal) => requestJson<FaultSearchDetail>(`/api/fault-searches/${encodeURIComponent(searchId)}`, signal);
export const startFaultSearch = (logId: string) => sendJson<{ id: string }>('POST', `${logBase(logId)}/fault-searches`);
export const cancelFaultSearch = (searchId: string) => sendJson<FaultSearchDetail>('POST', `/api/fault-searches/${encodeURIComponent(searchId)}/cancel`);

/**
 * Sends a log file as the request body, reporting the share sent as it goes (fetch cannot tell
 * upload progress; XMLHttpRequest can).
 */
export function uploadLog(circuitId: string, file: File, onProgress: (share: number) => void): Promise<UploadSummary> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `${circuitBase(circuitId)}/logs?name=${encodeURIComponent(file.name)}`);
    xhr.setRequestHeader('content-type', 'application/octet-stream');
    xhr.setRequestHeader('accept', 'application/json');
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onProgress(e.loaded / e.total);
    };
    xhr.onload = () => {
      let body: unknown = null;
      try {
        body = JSON.parse(xhr.responseText);
      } catch {
        // An answer that is not JSON is reported by its status below.
      }
      if (xhr.status >= 200 && xhr.status < 300 && body) resolve(body as UploadSummary);
      else {
        const message = (body as { error?: { message?: string } } | null)?.error?.message ?? `The server answered with status ${xhr.status}.`;
        reject(new Error(message));
      }
    };
    xhr.onerror = () => reject(new Error('Could not reach the server. Check the connection and try again.'));
    xhr.send(file);
  });
}
