import 'server-only';
import type { CircuitDocument } from '@/engine/document/schema';
import { describeVariations, type Counterexample, type SearchProgress, type SearchResult, type Variation } from '@/engine/proof/search';
import { compile } from '@/engine/solver/compile';
import { recordAudit } from '@/lib/audit';
import type { Actor } from '@/lib/auth/actor';
import { findCircuit, revisionInWorkspaceIncludes } from '@/lib/circuits/revision-view';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { sendProofJob } from '@/lib/jobs/queue';
import { personOf, type Person } from '@/lib/person';
import { bindRulesText } from '@/lib/proofs/bind-rules';
import { revisionWithDocument } from '@/lib/proofs/revision-with-document';
import type { ListProofsQuery, StartProofBody } from '@/lib/proofs/schemas';
import { CircuitRevision, Proof, User, type JobStatus } from '@/models';

/** Progress of a running proof as the worker last wrote it. */
export interface ProofProgress extends SearchProgress {
  /** Seconds still to go at the rate so far; null before the first path is done. */
  estimateS: number | null;
}

/** A rule's outcome as stored: the search's, with the rule's line and the run that replays its counterexample. */
export interface StoredRuleOutcome {
  name: string;
  line: number | null;
  status: 'passed' | 'failed';
  sequences: number;
  states: number;
  counterexample: (Counterexample & { runId: string | null }) | null;
}

export type StoredProofResult = Omit<SearchResult, 'rules'> & { rules: StoredRuleOutcome[] };

export interface ProofSummary {
  id: string;
  circuitId: string;
  revisionNumber: number;
  status: JobStatus;
  variations: Variation[];
  quantumS: number;
  steps: number;
  settleS: number;
  progress: ProofProgress | null;
  /** Rules that held and that failed; null until the search has a result. */
  outcome: { passed: number; failed: number; complete: boolean } | null;
  error: string | null;
  createdBy: Person;
  createdAt: string;
  startedAt: string | null;
  finishedAt: string | null;
}

export interface ProofDetail extends ProofSummary {
  rulesText: string;
  result: StoredProofResult | null;
}

export interface ProofPage {
  items: ProofSummary[];
  page: number;
  pageSize: number;
  total: number;
}

type LoadedProof = Proof & { revision: CircuitRevision; createdBy: User };

function proofSummary(proof: LoadedProof): ProofSummary {
  const result = proof.result as StoredProofResult | null;
  return {
    id: proof.id,
    circuitId: proof.revision.circuitId,
    revisionNumber: proof.revision.number,
    status: proof.status,
    variations: proof.variations as Variation[],
    quantumS: proof.quantumS,
    steps: proof.steps,
    settleS: proof.settleS,
    progress: proof.progress as ProofProgress | null,
    outcome: result ? { passed: result.rules.filter((r) => r.status === 'passed').length, failed: result.rules.filter((r) => r.status === 'failed').length, complete: result.complete } : null,
    error: proof.error,
    createdBy: personOf(proof.createdBy),
    createdAt: proof.createdAt.toISOString(),
    startedAt: proof.startedAt?.toISOString() ?? null,
    finishedAt: proof.finishedAt?.toISOString() ?? null,
  };
}

function proofDetail(proof: LoadedProof): ProofDetail {
  return { ...proofSummary(proof), rulesText: proof.rulesText, result: proof.result as StoredProofResult | null };
}

async function findProof({ workspaceId, proofId }: { workspaceId: string; proofId: string }): Promise<LoadedProof> {
  getSequelize();
  const proof = (await Proof.findOne({ where: { id: proofId }, include: revisionInWorkspaceIncludes(workspaceId) })) as LoadedProof | null;
  if (!proof) throw new AppError('not_found', 'proof', 'No such proof in this workspace');
  return proof;
}

/** Each variation must name a part of the drawing that can vary that way; the error names the entry at fault. */
function checkVariations(document: CircuitDocument, variations: readonly Variation[], revisionNumber: number): void {
  const offered = new Map(describeVariations(document).map((v) => [v.tag, v.kinds]));
  variations.forEach((variation, i) => {
    const kinds = offered.get(variation.tag);
    if (!kinds) {
      const field = `variations.${i}.tag`;
      const known = document.components.some((c) => c.tag === variation.tag);
      throw new AppError('invalid', field, `${field}: ${known ? `nothing about ${variation.tag} can be varied` : `revision ${revisionNumber} has no part tagged ${variation.tag}`}`, field);
    }
    if (!kinds.includes(variation.kind)) {
      const field = `variations.${i}.kind`;
      throw new AppError('invalid', field, `${field}: ${variation.tag} cannot vary as ${variation.kind}; it can: ${kinds.join(', ')}`, field);
    }
  });
}

/**
 * Starts a proof: checks everything the worker will need (the drawing compiles, the rules bind,
 * the variations fit), records the proof as queued and sends it to the job queue. If the queue
 * refuses it, the proof is marked failed at once — a queued row no worker will ever take would
 * otherwise wait forever — and the caller gets `unavailable:queue`.
 */
export async function startProof({ actor, circuitId, input }: { actor: Actor; circuitId: string; input: StartProofBody }): Promise<{ id: string }> {
  const sequelize = getSequelize();
  const { revision, document } = await revisionWithDocument({ workspaceId: actor.workspaceId, circuitId, number: input.revisionNumber });
  const { model, diagnostics } = compile(document);
  if (!model) {
    const first = diagnostics.find((d) => d.severity === 'error');
    throw new AppError('invalid', 'revisionNumber', `Revision ${revision.number}'s drawing has errors, so it cannot be proved: ${first?.message ?? 'see Checks'}`, 'revisionNumber');
  }
  const rules = bindRulesText({ text: input.rulesText, document, revisionNumber: revision.number, field: 'rulesText' });
  if (!rules.length) throw new AppError('invalid', 'rulesText', 'rulesText: write at least one rule', 'rulesText');
  checkVariations(document, input.variations, revision.number);
  const proof = await sequelize.transaction(async (transaction) => {
    const created = await Proof.create(
      { revisionId: revision.id, rulesText: input.rulesText, variations: input.variations, quantumS: input.quantumS, steps: input.steps, settleS: input.settleS, createdById: actor.userId, progress: null, result: null, error: null, startedAt: null, finishedAt: null },
      { transaction },
    );
    await recordAudit({ action: 'proof.started', actorId: actor.userId, workspaceId: actor.workspaceId, targetType: 'proof', targetId: created.id, data: { circuitId, revisionNumber: revision.number } }, transaction);
    return created;
  });
  try {
    await sendProofJob({ proofId: proof.id });
  } catch (error) {
    console.error('[airproof] could not queue proof', proof.id, error);
    await Proof.update({ status: 'failed', error: 'The proof could not be queued; start it again', finishedAt: new Date() }, { where: { id: proof.id, status: 'queued' } });
    throw new AppError('unavailable', 'queue', 'The proof queue is not answering; try again in a moment');
  }
  return { id: proof.id };
}

/** One page of a circuit's proofs over all its revisions, newest first. */
export async function listProofs({ workspaceId, circuitId, query }: { workspaceId: string; circuitId: string; query: ListProofsQuery }): Promise<ProofPage> {
  getSequelize();
  await findCircuit({ workspaceId, circuitId });
  const { rows, count } = await Proof.findAndCountAll({
    include: [
      { model: CircuitRevision, as: 'revision', attributes: ['id', 'number', 'circuitId'], required: true, where: { circuitId } },
      { model: User, as: 'createdBy', attributes: ['id', 'name'] },
    ],
    order: [
      ['createdAt', 'DESC'],
      ['id', 'ASC'],
    ],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  return { items: (rows as LoadedProof[]).map(proofSummary), page: query.page, pageSize: query.pageSize, total: count };
}

export async function getProof({ workspaceId, proofId }: { workspaceId: string; proofId: string }): Promise<ProofDetail> {
  return proofDetail(await findProof({ workspaceId, proofId }));
}

/** Cancels a queued or running proof; the worker sees it at its next progress write and stops. A finished one is `conflict:proof`. */
export async function cancelProof({ actor, proofId }: { actor: Actor; proofId: string }): Promise<ProofDetail> {
  const sequelize = getSequelize();
  const proof = await findProof({ workspaceId: actor.workspaceId, proofId });
  await sequelize.transaction(async (transaction) => {
    const [count] = await Proof.update({ status: 'cancelled', finishedAt: new Date() }, { where: { id: proofId, status: ['queued', 'running'] }, transaction });
    if (!count) {
      const { status } = await Proof.findByPk(proofId, { attributes: ['status'], rejectOnEmpty: true, transaction });
      throw new AppError('conflict', 'proof', `This proof has already finished (${status}); there is nothing to cancel`);
    }
    await recordAudit({ action: 'proof.cancelled', actorId: actor.userId, workspaceId: actor.workspaceId, targetType: 'proof', targetId: proofId }, transaction);
  });
  return proofDetail(await findProof({ workspaceId: actor.workspaceId, proofId: proof.id }));
}
