// One engine thread of the proof task pool (./task-pool.ts): runs the paths it is sent with the
// rules compiled once per drawing and rules text.
import { parentPort } from 'node:worker_threads';
import type { CircuitDocument } from '@/engine/document/schema';
import { checkRules, compileRulesText, type BoundRule } from '@/engine/proof/rules';
import { runProofTask, type ProofTask, type ProofTaskResult } from '@/engine/proof/search';

/** A batch of paths for one drawing and rules text; `document` and `rulesText` come with the first batch of each `key`. */
export interface TaskRequest {
  id: number;
  key: number;
  document?: CircuitDocument;
  rulesText?: string;
  tasks: ProofTask[];
}

export type TaskReply = { id: number; results: ProofTaskResult[] } | { id: number; error: string };

/** Drawings and rules kept compiled; a worker of the job queue serves one proof at a time, so a few are plenty. */
const CACHE_SIZE = 4;
const cache = new Map<number, { document: CircuitDocument; rules: BoundRule[] }>();

function compiled(request: TaskRequest): { document: CircuitDocument; rules: BoundRule[] } {
  const hit = cache.get(request.key);
  if (hit) return hit;
  if (!request.document || request.rulesText === undefined) throw new Error(`drawing and rules ${request.key} were never sent to this thread`);
  const { rules, errors } = compileRulesText(request.rulesText, request.document);
  if (errors.length) throw new Error(`the rules do not compile: line ${errors[0]!.line}, column ${errors[0]!.column}: ${errors[0]!.message}`);
  const entry = { document: request.document, rules };
  cache.set(request.key, entry);
  if (cache.size > CACHE_SIZE) cache.delete(cache.keys().next().value!);
  return entry;
}

parentPort?.on('message', (request: TaskRequest) => {
  let reply: TaskReply;
  try {
    const { document, rules } = compiled(request);
    reply = { id: request.id, results: request.tasks.map((task) => runProofTask(document, task, (trace) => checkRules(rules, trace))) };
  } catch (error) {
    reply = { id: request.id, error: error instanceof Error ? error.message : String(error) };
  }
  parentPort!.postMessage(reply);
});
