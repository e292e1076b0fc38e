import 'server-only';
import { checkRules, compileRulesText, longestWindowS } from '@/engine/proof/rules';
import { runProofSearch, type SearchProgress, type Variation } from '@/engine/proof/search';
import { documentOf } from '@/lib/circuits/revision-view';
import { getSequelize } from '@/lib/db';
import { estimateS, progressWriter } from '@/lib/jobs/progress-writer';
import { PROOF_QUEUE, workQueue, type ProofJob, type QueueWorker } from '@/lib/jobs/queue';
import { claimProof, failProof, keepCancelledResult, readProofStatus, recordProofResult, writeProgress } from '@/lib/proofs/proof-records';
import type { ProofProgress } from '@/lib/proofs/proofs';
import { createTaskPool } from '@/lib/proofs/task-pool';
import { CircuitRevision } from '@/models';

type RunBatch = ReturnType<typeof createTaskPool>['runBatch'];

function withEstimate(p: SearchProgress): ProofProgress {
  return { ...p, estimateS: estimateS(p.done, p.total, p.elapsedS) };
}

/** Works one proof from queued to succeeded, failed or cancelled. Never throws: what goes wrong is written on the proof. */
async function workProof(proofId: string, { runBatch, isStopping }: { runBatch: RunBatch; isStopping: () => boolean }): Promise<void> {
  const proof = await claimProof(proofId);
  if (!proof) return;
  try {
    const revision = await CircuitRevision.findByPk(proof.revisionId, { rejectOnEmpty: true });
    const document = documentOf(revision, 'revisionNumber');
    const { rules, errors } = compileRulesText(proof.rulesText, document);
    if (errors.length) throw new Error(`the rules no longer bind to revision ${revision.number}: line ${errors[0]!.line}, column ${errors[0]!.column}: ${errors[0]!.message}`);
    const lines = new Map(rules.map((rule) => [rule.name, rule.line]));

    const progress = progressWriter({ write: (p: ProofProgress) => writeProgress(proof.id, p), readStatus: () => readProofStatus(proof.id) }, `proof ${proof.id}`);
    const onProgress = (p: SearchProgress): void => progress.report(withEstimate(p));

    const result = await runProofSearch(
      { document, variations: proof.variations as Variation[], quantumS: proof.quantumS, steps: proof.steps, settleS: proof.settleS, historyS: longestWindowS(rules) },
      (trace) => checkRules(rules, trace),
      { runBatch: (tasks) => runBatch(document, proof.rulesText, tasks), onProgress, shouldStop: () => progress.cancelled || isStopping() },
    );
    await progress.settle();
    if (progress.cancelled) return await keepCancelledResult(proof.id, result, lines, progress.latest);
    if (!result.complete) return await failProof(proof.id, 'The proof worker was stopped before this proof finished; start it again');
    await recordProofResult({ proof, document, result, lines, progress: progress.latest });
  } catch (error) {
    console.error('[airproof] proof failed', proof.id, error);
    await failProof(proof.id, `The search stopped with an error: ${error instanceof Error ? error.message : String(error)}`);
  }
}

/**
 * Works the proof queue in this process, one proof at a time, each search spread over `threads`
 * worker threads. More processes (on more machines) each take their own proofs from the queue.
 */
export async function startProofWorker({ threads }: { threads: number }): Promise<QueueWorker> {
  getSequelize();
  const pool = createTaskPool({ size: threads });
  return workQueue<ProofJob>(PROOF_QUEUE, (data, isStopping) => workProof(data.proofId, { runBatch: (document, rulesText, tasks) => pool.runBatch(document, rulesText, tasks), isStopping }), () => pool.close());
}
