import { parentPort } from 'node:worker_threads';

/** A batch of tasks for one context; `context` comes with the first batch of each `key` a thread gets. */
export interface ThreadRequest<C, T> {
  id: number;
  key: number;
  context?: C;
  tasks: T[];
}

export type ThreadReply<R> = { id: number; results: R[] } | { id: number; error: string };

/** Contexts kept prepared; a worker of the job queue serves one job at a time, so a few are plenty. */
const CACHE_SIZE = 4;

/**
 * The thread side of a ThreadPool (./thread-pool.ts): prepares each context once (compiles rules,
 * say) and runs every task of a batch against it. Call it from the module the pool starts.
 */
export function serveTasks<C, P, T, R>({ prepare, run }: { prepare(context: C): P; run(prepared: P, task: T): R }): void {
  const cache = new Map<number, P>();
  const prepared = (request: ThreadRequest<C, T>): P => {
    const hit = cache.get(request.key);
    if (hit !== undefined) return hit;
    if (request.context === undefined) throw new Error(`context ${request.key} was never sent to this thread`);
    const entry = prepare(request.context);
    cache.set(request.key, entry);
    if (cache.size > CACHE_SIZE) cache.delete(cache.keys().next().value!);
    return entry;
  };
  parentPort?.on('message', (request: ThreadRequest<C, T>) => {
    let reply: ThreadReply<R>;
    try {
      const context = prepared(request);
      reply = { id: request.id, results: request.tasks.map((task) => run(context, task)) };
    } catch (error) {
      reply = { id: request.id, error: error instanceof Error ? error.message : String(error) };
    }
    parentPort!.postMessage(reply);
  });
}
