import 'server-only';
import { faultSearch, type FaultSearchProgress as EngineProgress } from '@/engine/replay';
import type { ColumnMapping } from '@/lib/field-logs';
import { documentOf } from '@/lib/circuits/revision-view';
import { getSequelize } from '@/lib/db';
import { FAULT_SEARCH_QUEUE, workQueue, type FaultSearchJob } from '@/lib/jobs/queue';
import { claimFaultSearch, failFaultSearch, keepCancelledFaultSearch, recordFaultSearchResult, writeFaultSearchProgress } from '@/lib/replays/fault-search-records';
import type { FaultSearchProgress } from '@/lib/replays/fault-searches';
import { createFaultTaskPool, type FaultTaskPool } from '@/lib/replays/fault-task-pool';
import { recordedLogOf } from '@/lib/replays/recorded-log';
import { CircuitRevision, Upload } from '@/models';

/** Least time between two progress writes of one search; each write also reads whether it was cancelled. */
const PROGRESS_WRITE_MS = 500;


export interface FaultWorker {
  /** Stops taking searches, stops the one in hand (marked failed, to be started again) and closes the threads. */
  stop(): Promise<void>;
}

function withEstimate(p: EngineProgress, startedAt: number): FaultSearchProgress {
  const elapsedS = (Date.now() - startedAt) / 1000;
  const estimateS = p.done > 0 ? (elapsedS * Math.max(0, p.total - p.done)) / p.done : null;
  return { done: p.done, total: p.total, elapsedS, estimateS };
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
    let cancelled = false;
    let latest: FaultSearchProgress | null = null;
    let lastWriteAt = 0;
    let writing: Promise<void> | null = null;
    const onProgress = (p: EngineProgress): void => {
      latest = withEstimate(p, startedAt);
      const now = Date.now();
      if (writing || now - lastWriteAt < PROGRESS_WRITE_MS) return;
      lastWriteAt = now;
      writing = writeFaultSearchProgress(search.id, latest)
        .then((status) => {
          cancelled = status === 'cancelled';
        })
        .catch((error: unknown) => console.error('[airproof] could not write fault search progress', search.id, error))
        .finally(() => {
          writing = null;
        });
    };

    const result = await faultSearch(document, log, { onProgress, shouldStop: () => cancelled || isStopping(), ...(pool ? { runBatch: (tasks) => pool.runBatch(tasks) } : {}) });
    await writing;
    if (cancelled) return await keepCancelledFaultSearch(search.id, result, latest);
    if (!result.complete) return await failFaultSearch(search.id, 'The worker was stopped before this search finished; start it again');
    await recordFaultSearchResult(search.id, result, latest);
  } catch (error) {
    console.error('[airproof] fault search failed', search.id, error);
    await failFaultSearch(search.id, `The search stopped with an error: ${error instanceof Error ? error.message : String(error)}`);
  }
}

/**
 * Works the fault-search queue in this process, one search at a time, its simulations spread over
 * `threads` worker threads (0: in this thread, for tests and one-core machines).
 */
export async function startFaultWorker({ threads }: { threads: number }): Promise<FaultWorker> {
  getSequelize();
  const pool = threads > 0 ? createFaultTaskPool({ size: threads }) : null;
  return workQueue<FaultSearchJob>(FAULT_SEARCH_QUEUE, (data, isStopping) => workFaultSearch(data.faultSearchId, { pool, isStopping }), () => pool?.close() ?? Promise.resolve());
}
