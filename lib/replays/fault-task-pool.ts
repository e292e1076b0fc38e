import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { FaultTask, FaultTaskResult } from '@/engine/replay';
import { createThreadPool } from '@/lib/jobs/thread-pool';
import type { FaultContext } from './fault-task-worker';

export interface FaultTaskPool {
  /** faultSearch's runBatch: the tasks spread over the threads, results in the order of `tasks`. */
  runBatch(tasks: FaultTask[]): Promise<FaultTaskResult[]>;
  close(): Promise<void>;
}

function moduleDirectory(): string {
  // tsx runs this file as CommonJS (with __dirname); vitest runs it as an ES module.
  return typeof __dirname === 'string' ? __dirname : path.dirname(fileURLToPath(import.meta.url));
}

/**
 * `size` engine threads for a fault search. The tasks of one search share their drawing and log
 * objects; those go to each thread once, and each task after that is only its list of faults.
 */
export function createFaultTaskPool({ size }: { size: number }): FaultTaskPool {
  const pool = createThreadPool<FaultContext, FaultTask['faults'], FaultTaskResult>({ size, workerFile: path.join(moduleDirectory(), 'fault-task-worker.ts') });
  const contexts = new WeakMap<object, WeakMap<object, FaultContext>>();
  const contextOf = ({ document, log, compare, replay }: FaultTask): FaultContext => {
    let byLog = contexts.get(document);
    if (!byLog) contexts.set(document, (byLog = new WeakMap()));
    let context = byLog.get(log);
    if (!context) byLog.set(log, (context = { document, log, compare, replay }));
    return context;
  };
  return {
    async runBatch(tasks) {
      if (!tasks.length) return [];
      const context = contextOf(tasks[0]!);
      if (tasks.some((t) => t.document !== context.document || t.log !== context.log)) throw new Error('a batch of fault tasks must share one drawing and log');
      return pool.runBatch(context, tasks.map((t) => t.faults));
    },
    close: () => pool.close(),
  };
}
