import 'server-only';
import { randomUUID } from 'node:crypto';
import type { CreationAttributes } from 'sequelize';
import type { CircuitDocument } from '@/engine/document/schema';
import type { SearchResult } from '@/engine/proof/search';
import { getSequelize } from '@/lib/db';
import type { ProofProgress, StoredProofResult, StoredRuleOutcome } from '@/lib/proofs/proofs';
import { storeRunTrace } from '@/lib/runs/save-run';
import { simulateSavedRun, type RunSummary } from '@/lib/runs/simulate-saved-run';
import { Proof, Run, type JobStatus } from '@/models';

/** What a counterexample run's summary holds beside the trace figures. */
export interface ProofRunSummary extends RunSummary {
  proofId: string;
  verdict: { rule: string; line: number | null; violatedAtS: number; explanation: string };
}

/**
 * Takes a queued proof for this worker: running from now. Null when it is not queued any more
 * (cancelled before a worker got to it), so the job has nothing to do.
 */
export async function claimProof(proofId: string): Promise<Proof | null> {
  getSequelize();
  const [count, rows] = await Proof.update({ status: 'running', startedAt: new Date() }, { where: { id: proofId, status: 'queued' }, returning: true });
  return count ? rows[0]! : null;
}

/** Writes the progress and reads back the status, so a cancel made meanwhile is seen by the search. */
export async function writeProgress(proofId: string, progress: ProofProgress): Promise<JobStatus> {
  getSequelize();
  const [, rows] = await Proof.update({ progress }, { where: { id: proofId }, returning: ['status'] });
  return rows[0]?.status ?? 'cancelled';
}

/** The proof's status, read between progress writes so that a cancel is seen soon. */
export async function readProofStatus(proofId: string): Promise<JobStatus> {
  getSequelize();
  const row = await Proof.findByPk(proofId, { attributes: ['status'] });
  return row?.status ?? 'cancelled';
}

export async function failProof(proofId: string, error: string): Promise<void> {
  getSequelize();
  await Proof.update({ status: 'failed', error, finishedAt: new Date() }, { where: { id: proofId, status: ['queued', 'running'] } });
}

/** Keeps what a cancelled search found before it stopped; the proof stays cancelled. */
export async function keepCancelledResult(proofId: string, result: SearchResult, lines: ReadonlyMap<string, number>, progress: ProofProgress | null): Promise<void> {
  getSequelize();
  await Proof.update({ result: storedResult(result, lines, new Map()), progress }, { where: { id: proofId, status: 'cancelled' } });
}

function storedResult(result: SearchResult, lines: ReadonlyMap<string, number>, runIds: ReadonlyMap<string, string>): StoredProofResult {
  const rules = result.rules.map(
    (rule): StoredRuleOutcome => ({ ...rule, line: lines.get(rule.name) ?? null, counterexample: rule.counterexample && { ...rule.counterexample, runId: runIds.get(rule.name) ?? null } }),
  );
  return { ...result, rules };
}

/**
 * Records a finished search: each failed rule's counterexample simulated again on the revision
 * (at the saved-run interval, so it replays like any saved run) as a run of kind 'proof' named
 * after the rule, then the result with the runs' ids, and the proof succeeded — all unless it was
 * cancelled meanwhile, when nothing is written. Traces go to storage first, outside the transaction.
 */
export async function recordProofResult({
  proof,
  document,
  result,
  lines,
  progress,
}: {
  proof: Proof;
  document: CircuitDocument;
  result: SearchResult;
  lines: ReadonlyMap<string, number>;
  progress: ProofProgress | null;
}): Promise<void> {
  const sequelize = getSequelize();
  const runs: Array<CreationAttributes<Run>> = [];
  const runIds = new Map<string, string>();
  for (const rule of result.rules) {
    const example = rule.counterexample;
    if (!example) continue;
    const { trace, summary } = simulateSavedRun({ document, inputs: example.inputs, untilS: example.untilS });
    const runId = randomUUID();
    const traceKey = await storeRunTrace({ runId, trace });
    const verdict = { rule: rule.name, line: lines.get(rule.name) ?? null, violatedAtS: example.violatedAtS, explanation: example.explanation };
    const runSummary: ProofRunSummary = { ...summary, proofId: proof.id, verdict };
    runs.push({ id: runId, revisionId: proof.revisionId, proofId: proof.id, kind: 'proof', name: rule.name.slice(0, 120), status: 'succeeded', inputs: example.inputs, summary: runSummary, traceKey, createdById: proof.createdById, finishedAt: new Date() });
    runIds.set(rule.name, runId);
  }
  await sequelize.transaction(async (transaction) => {
    const [count] = await Proof.update(
      { status: 'succeeded', result: storedResult(result, lines, runIds), progress, finishedAt: new Date() },
      { where: { id: proof.id, status: 'running' }, transaction },
    );
    if (count) await Run.bulkCreate(runs, { transaction });
  });
}
