import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { ThreadReply, ThreadRequest } from './thread-tasks';

/**
 * A pool of engine threads (node:worker_threads) for the many independent simulations of a job:
 * the paths of a proof, the candidate faults of a fault search. Each batch comes with a context
 * (the drawing and whatever else every task shares); a thread is sent a context only with its
 * first batch of it and keeps it prepared, so a batch carries only its small tasks.
 */
export interface ThreadPool<C extends object, T, R> {
  /** Runs the tasks spread over the threads; the results come back in the order of `tasks`. */
  runBatch(context: C, tasks: T[]): Promise<R[]>;
  /** Ends the threads; batches still running are rejected. */
  close(): Promise<void>;
}

/** Pieces each thread gets of a batch, so that a thread done early takes more instead of waiting. */
const PIECES_PER_THREAD = 4;

function moduleDirectory(): string {
  // tsx runs this file as CommonJS (with __dirname); vitest runs it as an ES module.
  return typeof __dirname === 'string' ? __dirname : path.dirname(fileURLToPath(import.meta.url));
}

/**
 * A thread running `workerFile` (a module that calls serveTasks). The thread has no TypeScript
 * loader of its own, so it registers tsx's CommonJS hooks (which also resolve the `@/` paths of
 * tsconfig.json) before loading the module.
 */
function startThread(workerFile: string): Worker {
  const tsx = path.join(moduleDirectory(), '..', '..', 'node_modules', 'tsx', 'dist', 'cjs', 'index.cjs');
  return new Worker(`require(${JSON.stringify(tsx)}); require(${JSON.stringify(workerFile)});`, { eval: true });
}

interface Pending<R> {
  resolve: (results: R[]) => void;
  reject: (error: Error) => void;
}

/** `size` threads each running `workerFile` (an absolute path). Contexts are told apart by identity: pass the same object for the same context. */
export function createThreadPool<C extends object, T, R>({ size, workerFile }: { size: number; workerFile: string }): ThreadPool<C, T, R> {
  if (!Number.isInteger(size) || size < 1) throw new Error('a task pool needs at least one thread');
  const threads = Array.from({ length: size }, () => ({ worker: startThread(workerFile), keys: new Set<number>(), pending: new Map<number, Pending<R>>() }));
  const keys = new WeakMap<C, number>();
  let nextKey = 0;
  let nextId = 0;
  let closed = false;

  for (const thread of threads) {
    thread.worker.on('message', (reply: ThreadReply<R>) => {
      const waiting = thread.pending.get(reply.id);
      thread.pending.delete(reply.id);
      if ('error' in reply) waiting?.reject(new Error(reply.error));
      else waiting?.resolve(reply.results);
    });
    const failAll = (error: Error) => {
      for (const waiting of thread.pending.values()) waiting.reject(error);
      thread.pending.clear();
    };
    thread.worker.on('error', failAll);
    thread.worker.on('exit', (code) => failAll(new Error(`an engine thread ended (exit code ${code})`)));
  }

  const keyOf = (context: C): number => {
    let key = keys.get(context);
    if (key === undefined) keys.set(context, (key = nextKey++));
    return key;
  };

  const send = (thread: (typeof threads)[number], key: number, context: C, tasks: T[]) =>
    new Promise<R[]>((resolve, reject) => {
      const id = nextId++;
      const first = !thread.keys.has(key);
      thread.keys.add(key);
      thread.pending.set(id, { resolve, reject });
      const request: ThreadRequest<C, T> = { id, key, tasks, ...(first ? { context } : {}) };
      thread.worker.postMessage(request);
    });

  return {
    async runBatch(context, tasks) {
      if (closed) throw new Error('the task pool is closed');
      const key = keyOf(context);
      const pieceSize = Math.max(1, Math.ceil(tasks.length / (size * PIECES_PER_THREAD)));
      const pieces: T[][] = [];
      for (let i = 0; i < tasks.length; i += pieceSize) pieces.push(tasks.slice(i, i + pieceSize));
      const results: R[][] = new Array(pieces.length);
      let next = 0;
      // Each thread takes the next piece as soon as it is free.
      await Promise.all(
        threads.map(async (thread) => {
          while (next < pieces.length) {
            const index = next++;
            results[index] = await send(thread, key, context, pieces[index]!);
          }
        }),
      );
      return results.flat();
    },
    async close() {
      closed = true;
      await Promise.all(threads.map((t) => t.worker.terminate()));
    },
  };
}
