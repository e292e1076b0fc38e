import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { CircuitDocument } from '@/engine/document/schema';
import type { ProofTask, ProofTaskResult } from '@/engine/proof/search';
import type { TaskReply, TaskRequest } from './task-worker';

export interface TaskPool {
  /** Runs the paths spread over the threads; the results come back in the order of `tasks`. */
  runBatch(document: CircuitDocument, rulesText: string, tasks: ProofTask[]): Promise<ProofTaskResult[]>;
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
 * A worker thread running ./task-worker.ts. The thread has no TypeScript loader of its own, so
 * it registers tsx's CommonJS hooks (which also resolve the `@/` paths of tsconfig.json) before
 * loading the worker module.
 */
function startThread(): Worker {
  const directory = moduleDirectory();
  const workerFile = path.join(directory, 'task-worker.ts');
  const tsx = path.join(directory, '..', '..', 'node_modules', 'tsx', 'dist', 'cjs', 'index.cjs');
  return new Worker(`require(${JSON.stringify(tsx)}); require(${JSON.stringify(workerFile)});`, { eval: true });
}

interface Pending {
  resolve: (results: ProofTaskResult[]) => void;
  reject: (error: Error) => void;
}

/**
 * A pool of `size` engine threads (node:worker_threads) for the paths of a proof search. Each
 * thread compiles the rules once per drawing (the same document object, batch after batch) and
 * rules text, which it is sent only with its first batch of them.
 */
export function createTaskPool({ size }: { size: number }): TaskPool {
  if (!Number.isInteger(size) || size < 1) throw new Error('a task pool needs at least one thread');
  const threads = Array.from({ length: size }, () => ({ worker: startThread(), keys: new Set<number>(), pending: new Map<number, Pending>() }));
  const keys = new WeakMap<CircuitDocument, Map<string, number>>();
  let nextKey = 0;
  let nextId = 0;
  let closed = false;

  for (const thread of threads) {
    thread.worker.on('message', (reply: TaskReply) => {
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

  const keyOf = (document: CircuitDocument, rulesText: string): number => {
    let byText = keys.get(document);
    if (!byText) keys.set(document, (byText = new Map()));
    let key = byText.get(rulesText);
    if (key === undefined) byText.set(rulesText, (key = nextKey++));
    return key;
  };

  const send = (thread: (typeof threads)[number], key: number, document: CircuitDocument, rulesText: string, tasks: ProofTask[]) =>
    new Promise<ProofTaskResult[]>((resolve, reject) => {
      const id = nextId++;
      const first = !thread.keys.has(key);
      thread.keys.add(key);
      thread.pending.set(id, { resolve, reject });
      const request: TaskRequest = { id, key, tasks, ...(first ? { document, rulesText } : {}) };
      thread.worker.postMessage(request);
    });

  return {
    async runBatch(document, rulesText, tasks) {
      if (closed) throw new Error('the task pool is closed');
      const key = keyOf(document, rulesText);
      const pieceSize = Math.max(1, Math.ceil(tasks.length / (size * PIECES_PER_THREAD)));
      const pieces: ProofTask[][] = [];
      for (let i = 0; i < tasks.length; i += pieceSize) pieces.push(tasks.slice(i, i + pieceSize));
      const results: ProofTaskResult[][] = new Array(pieces.length);
      let next = 0;
      // Each thread takes the next piece as soon as it is free.
      await Promise.all(
        threads.map(async (thread) => {
          while (next < pieces.length) {
            const index = next++;
            results[index] = await send(thread, key, document, rulesText, pieces[index]!);
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
