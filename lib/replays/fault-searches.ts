import 'server-only';
import type { FaultSearchResult } from '@/engine/replay';
import { recordAudit } from '@/lib/audit';
import type { Actor } from '@/lib/auth/actor';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { sendFaultSearchJob } from '@/lib/jobs/queue';
import { personOf, type Person } from '@/lib/person';
import { savedMappingOf } from '@/lib/replays/mappings';
import { recordedLogOf } from '@/lib/replays/recorded-log';
import { revisionWithDocument } from '@/lib/proofs/revision-with-document';
import type { ListFaultSearchesQuery, OnRevisionBody } from '@/lib/replays/schemas';
import { findLogUpload } from '@/lib/uploads/uploads';
import { CircuitRevision, FaultSearch, Upload, User, type JobStatus } from '@/models';

/** Progress of a running fault search as the worker last wrote it. */
export interface FaultSearchProgress {
  done: number;
  total: number;
  elapsedS: number;
  /** Seconds still to go at the rate so far; null before the first candidate is done. */
  estimateS: number | null;
}

export type BestCandidate = Pick<FaultSearchResult['candidates'][number], 'faultId' | 'tag' | 'label' | 'match'>;

export interface FaultSearchSummary {
  id: string;
  uploadId: string;
  circuitId: string;
  revisionNumber: number;
  status: JobStatus;
  progress: FaultSearchProgress | null;
  /** The best candidate of the result; null until there is one. */
  best: BestCandidate | null;
  error: string | null;
  createdBy: Person;
  createdAt: string;
  startedAt: string | null;
  finishedAt: string | null;
}

export interface FaultSearchDetail extends FaultSearchSummary {
  result: FaultSearchResult | null;
}

export interface FaultSearchPage {
  items: FaultSearchSummary[];
  page: number;
  pageSize: number;
  total: number;
}

type LoadedSearch = FaultSearch & { revision: CircuitRevision; createdBy: User };

function summaryOf(search: LoadedSearch): FaultSearchSummary {
  const result = search.result as FaultSearchResult | null;
  const top = result?.candidates[0];
  return {
    id: search.id,
    uploadId: search.uploadId,
    circuitId: search.revision.circuitId,
    revisionNumber: search.revision.number,
    status: search.status,
    progress: search.progress as FaultSearchProgress | null,
    best: top ? { faultId: top.faultId, tag: top.tag, label: top.label, match: top.match } : null,
    error: search.error,
    createdBy: personOf(search.createdBy),
    createdAt: search.createdAt.toISOString(),
    startedAt: search.startedAt?.toISOString() ?? null,
    finishedAt: search.finishedAt?.toISOString() ?? null,
  };
}

function detailOf(search: LoadedSearch): FaultSearchDetail {
  return { ...summaryOf(search), result: search.result as FaultSearchResult | null };
}

const includes = (workspaceId: string) => [
  { model: CircuitRevision, as: 'revision', attributes: ['id', 'number', 'circuitId'], required: true },
  { model: Upload, as: 'upload', attributes: [], required: true, where: { workspaceId } },
  { model: User, as: 'createdBy', attributes: ['id', 'name'] },
];

async function findSearch({ workspaceId, faultSearchId }: { workspaceId: string; faultSearchId: string }): Promise<LoadedSearch> {
  getSequelize();
  const search = (await FaultSearch.findOne({ where: { id: faultSearchId }, include: includes(workspaceId) })) as LoadedSearch | null;
  if (!search) throw new AppError('not_found', 'fault_search', 'No such fault search in this workspace');
  return search;
}

/**
 * Starts a fault search of a log on a revision: checks first that the log maps and drives the
 * drawing (a replay that cannot run gives the same 400 here, not a failed job later), records the
 * search as queued with the mapping as it is now, then sends the job. A queue that refuses it
 * leaves the search failed at once and answers `unavailable:queue`, as for proofs.
 */
export async function startFaultSearch({ actor, uploadId, input }: { actor: Actor; uploadId: string; input: OnRevisionBody }): Promise<{ id: string }> {
  const sequelize = getSequelize();
  const upload = await findLogUpload({ workspaceId: actor.workspaceId, uploadId });
  const { revision, document } = await revisionWithDocument({ workspaceId: actor.workspaceId, circuitId: upload.circuitId, number: input?.revisionNumber });
  const mapping = await savedMappingOf(upload.id);
  await recordedLogOf({ upload, mapping: mapping.mapping, document });
  const search = await sequelize.transaction(async (transaction) => {
    const created = await FaultSearch.create(
      { uploadId: upload.id, revisionId: revision.id, mapping: mapping.mapping, createdById: actor.userId, progress: null, result: null, error: null, startedAt: null, finishedAt: null },
      { transaction },
    );
    await recordAudit({ action: 'fault_search.started', actorId: actor.userId, workspaceId: actor.workspaceId, targetType: 'fault_search', targetId: created.id, data: { uploadId: upload.id, revisionNumber: revision.number } }, transaction);
    return created;
  });
  try {
    await sendFaultSearchJob({ faultSearchId: search.id });
  } catch (error) {
    console.error('[airproof] could not queue fault search', search.id, error);
    await FaultSearch.update({ status: 'failed', error: 'The search could not be queued; start it again', finishedAt: new Date() }, { where: { id: search.id, status: 'queued' } });
    throw new AppError('unavailable', 'queue', 'The job queue is not answering; try again in a moment');
  }
  return { id: search.id };
}

/** One page of a log's fault searches, newest first. */
export async function listFaultSearches({ workspaceId, uploadId, query }: { workspaceId: string; uploadId: string; query: ListFaultSearchesQuery }): Promise<FaultSearchPage> {
  getSequelize();
  await findLogUpload({ workspaceId, uploadId });
  const { rows, count } = await FaultSearch.findAndCountAll({
    where: { uploadId },
    include: includes(workspaceId),
    order: [
      ['createdAt', 'DESC'],
      ['id', 'ASC'],
    ],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  return { items: (rows as LoadedSearch[]).map(summaryOf), page: query.page, pageSize: query.pageSize, total: count };
}

export async function getFaultSearch({ workspaceId, faultSearchId }: { workspaceId: string; faultSearchId: string }): Promise<FaultSearchDetail> {
  return detailOf(await findSearch({ workspaceId, faultSearchId }));
}

/** Cancels a queued or running search; the worker sees it at its next progress write. A finished one is `conflict:fault_search`. */
export async function cancelFaultSearch({ actor, faultSearchId }: { actor: Actor; faultSearchId: string }): Promise<FaultSearchDetail> {
  const sequelize = getSequelize();
  await findSearch({ workspaceId: actor.workspaceId, faultSearchId });
  await sequelize.transaction(async (transaction) => {
    const [count] = await FaultSearch.update({ status: 'cancelled', finishedAt: new Date() }, { where: { id: faultSearchId, status: ['queued', 'running'] }, transaction });
    if (!count) {
      const { status } = await FaultSearch.findByPk(faultSearchId, { attributes: ['status'], rejectOnEmpty: true, transaction });
      throw new AppError('conflict', 'fault_search', `This fault search has already finished (${status}); there is nothing to cancel`);
    }
    await recordAudit({ action: 'fault_search.cancelled', actorId: actor.userId, workspaceId: actor.workspaceId, targetType: 'fault_search', targetId: faultSearchId }, transaction);
  });
  return detailOf(await findSearch({ workspaceId: actor.workspaceId, faultSearchId }));
}
