import 'server-only';
import type { FaultSearchResult } from '@/engine/replay';
import { getSequelize } from '@/lib/db';
import type { FaultSearchProgress } from '@/lib/replays/fault-searches';
import { FaultSearch, type JobStatus } from '@/models';

/** Takes a queued search for this worker; null when it is not queued any more (cancelled first). */
export async function claimFaultSearch(faultSearchId: string): Promise<FaultSearch | null> {
  getSequelize();
  const [count, rows] = await FaultSearch.update({ status: 'running', startedAt: new Date() }, { where: { id: faultSearchId, status: 'queued' }, returning: true });
  return count ? rows[0]! : null;
}

/** Writes the progress and reads back the status, so a cancel made meanwhile is seen by the search. */
export async function writeFaultSearchProgress(faultSearchId: string, progress: FaultSearchProgress): Promise<JobStatus> {
  getSequelize();
  const [, rows] = await FaultSearch.update({ progress }, { where: { id: faultSearchId }, returning: ['status'] });
  return rows[0]?.status ?? 'cancelled';
}

/** The search's status, read between progress writes so that a cancel is seen soon. */
export async function readFaultSearchStatus(faultSearchId: string): Promise<JobStatus> {
  getSequelize();
  const row = await FaultSearch.findByPk(faultSearchId, { attributes: ['status'] });
  return row?.status ?? 'cancelled';
}

export async function failFaultSearch(faultSearchId: string, error: string): Promise<void> {
  getSequelize();
  await FaultSearch.update({ status: 'failed', error, finishedAt: new Date() }, { where: { id: faultSearchId, status: ['queued', 'running'] } });
}

/** Keeps what a cancelled search ranked before it stopped; the search stays cancelled. */
export async function keepCancelledFaultSearch(faultSearchId: string, result: FaultSearchResult, progress: FaultSearchProgress | null): Promise<void> {
  getSequelize();
  await FaultSearch.update({ result, progress }, { where: { id: faultSearchId, status: 'cancelled' } });
}

/** Records a finished search, unless it was cancelled meanwhile. */
export async function recordFaultSearchResult(faultSearchId: string, result: FaultSearchResult, progress: FaultSearchProgress | null): Promise<void> {
  getSequelize();
  await FaultSearch.update({ status: 'succeeded', result, progress, finishedAt: new Date() }, { where: { id: faultSearchId, status: 'running' } });
}
