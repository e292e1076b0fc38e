import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { CircuitDocument } from '@/engine/document/schema';
import type { ProofTask, ProofTaskResult } from '@/engine/proof/search';
import { createThreadPool } from '@/lib/jobs/thread-pool';
import type { ProofContext } from './task-worker';

export interface TaskPool {
  /** Runs the paths spread over the threads; the results come back in the order of `tasks`. */
  runBatch(document: CircuitDocument, rulesText: string, tasks: ProofTask[]): Promise<ProofTaskResult[]>;
  /** Ends the threads; batches still running are rejected. */
  close(): Promise<void>;
}

function moduleDirectory(): string {
  // tsx runs this file as CommonJS (with __dirname); vitest runs it as an ES module.
  return typeof __dirname === 'string' ? __dirname : path.dirname(fileURLToPath(import.meta.url));
}

/**
 * A pool of `size` engine threads for the paths of a proof search. Each thread compiles the rules
 * once per drawing (the same document object, batch after batch) and rules text.
 */
export function createTaskPool({ size }: { size: number }): TaskPool {
  const pool = createThreadPool<ProofContext, ProofTask, ProofTaskResult>({ size, workerFile: path.join(moduleDirectory(), 'task-worker.ts') });
  // One context object per drawing and rules text, so the pool sends each only once to a thread.
  const contexts = new WeakMap<CircuitDocument, Map<string, ProofContext>>();
  const contextOf = (document: CircuitDocument, rulesText: string): ProofContext => {
    let byText = contexts.get(document);
    if (!byText) contexts.set(document, (byText = new Map()));
    let context = byText.get(rulesText);
    if (!context) byText.set(rulesText, (context = { document, rulesText }));
    return context;
  };
  return {
    runBatch: (document, rulesText, tasks) => pool.runBatch(contextOf(document, rulesText), tasks),
    close: () => pool.close(),
  };
}
