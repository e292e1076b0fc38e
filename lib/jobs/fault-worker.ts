import 'server-only';
import { faultSearch, type FaultSearchProgress as EngineProgress } from '@/engine/replay';
import type { ColumnMapping } from '@/lib/field-logs';
import { documentOf } from '@/lib/circuits/revision-view';
import { getSequelize } from '@/lib/db';
import { estimateS, progressWriter } from '@/lib/jobs/progress-writer';
import { FAULT_SEARCH_QUEUE, workQueue, type FaultSearchJob, type QueueWorker } from '@/lib/jobs/queue';
import { claimFaultSearch, failFaultSearch, keepCancelledFaultSearch, readFaultSearchStatus, recordFaultSearchResult, writeFaultSearchProgress } from '@/lib/replays/fault-search-records';
import type { FaultSearchProgress } from '@/lib/replays/fault-searches';
import { createFaultTaskPool, type FaultTaskPool } from '@/lib/replays/fault-task-pool';
import { recordedLogOf } from '@/lib/replays/recorded-log';
import { CircuitRevision, Upload } from '@/models';

function withEstimate(p: EngineProgress, startedAt: number): FaultSearchProgress {
  const elapsedS = (Date.now() - startedAt) / 1000;
  return { done: p.done, total: p.total, elapsedS, estimateS: estimateS(p.done, p.total, elapsedS) };
}

/** Works one search from queued to succeeded, failed or cancelled. Never throws: what goes wrong is written on the search. */
async function workFaultSearch(faultSearchId: string, { pool, isStopping }: { pool: FaultTaskPool | null; isStopping: () => boolean }): Promise<void> {
  const search = await claimFaultSearch(faultSearchId);
  if (!search) return;
  try {
    const revision = await CircuitRevision.findByPk(search.revisionId, { rejectOnEmpty: true });
    const upload = await Upload.findByPk(search.uploadId, { rejectOnEmpty: true });
    const document = documentOf(revision, 'revisionNumber');
    const log = await recordedLogOf({ upload, mapping: search.mapping as ColumnMapping, document });

    const startedAt = Date.now();
    const progress = progressWriter(
      { write: (p: FaultSearchProgress) => writeFaultSearchProgress(search.id, p), readStatus: () => readFaultSearchStatus(search.id) },
      `fault search ${search.id}`,
    );
    const onProgress = (p: EngineProgress): void => progress.report(withEstimate(p, startedAt));

    const result = await faultSearch(document, log, { onProgress, shouldStop: () => progress.cancelled || isStopping(), ...(pool ? { runBatch: (tasks) => pool.runBatch(tasks) } : {}) });
    await progress.settle();
    if (progress.cancelled) return await keepCancelledFaultSearch(search.id, result, progress.latest);
    if (!result.complete) return await failFaultSearch(search.id, 'The worker was stopped before this search finished; start it again');
    await recordFaultSearchResult(search.id, result, progress.latest);
  } catch (error) {
    console.error('[airproof] fault search failed', search.id, error);
    await failFaultSearch(search.id, `The search stopped with an error: ${error instanceof Error ? error.message : String(error)}`);
  }
}

/**
 * Works the fault-search queue in this process, one search at a time, its simulations spread over
 * `threads` worker threads (0: in this thread, for tests and one-core machines).
 */
export async function startFaultWorker({ threads }: { threads: number }): Promise<QueueWorker> {
  getSequelize();
  const pool = threads > 0 ? createFaultTaskPool({ size: threads }) : null;
  return workQueue<FaultSearchJob>(FAULT_SEARCH_QUEUE, (data, isStopping) => workFaultSearch(data.faultSearchId, { pool, isStopping }), () => pool?.close() ?? Promise.resolve());
}
