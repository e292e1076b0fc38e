import 'server-only';
import { findCircuit, revisionSummary, type RevisionSummary, type RevisionWithAuthor } from '@/lib/circuits/revision-view';
import type { ListRevisionsQuery } from '@/lib/circuits/schemas';
import { getSequelize } from '@/lib/db';
import { personOf, type Person } from '@/lib/person';
import { CircuitRevision, ReviewRequest, User, type ReviewState } from '@/models';

/** The latest review request of a revision, as the history shows it. */
export interface RevisionReview {
  id: string;
  state: ReviewState;
  stale: boolean;
  requestedBy: Person;
  decidedBy: Person | null;
  decidedAt: string | null;
}

export interface RevisionPage {
  items: Array<RevisionSummary & { review: RevisionReview | null }>;
  page: number;
  pageSize: number;
  total: number;
}

type ReviewWithPeople = ReviewRequest & { requestedBy: User; decidedBy: User | null };

/** One page of a circuit's revisions, newest first, each with its latest review request. */
export async function listRevisions({ workspaceId, circuitId, query }: { workspaceId: string; circuitId: string; query: ListRevisionsQuery }): Promise<RevisionPage> {
  getSequelize();
  await findCircuit({ workspaceId, circuitId });
  const { rows, count } = await CircuitRevision.findAndCountAll({
    where: { circuitId },
    attributes: ['id', 'number', 'message', 'createdAt', 'authorId'],
    include: [{ model: User, as: 'author', attributes: ['id', 'name'] }],
    order: [['number', 'DESC']],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  const revisions = rows as RevisionWithAuthor[];
  const reviews = (await ReviewRequest.findAll({
    where: { revisionId: revisions.map((r) => r.id) },
    include: [
      { model: User, as: 'requestedBy', attributes: ['id', 'name'] },
      { model: User, as: 'decidedBy', attributes: ['id', 'name'] },
    ],
    order: [['createdAt', 'DESC'], ['id', 'ASC']],
  })) as ReviewWithPeople[];
  return {
    items: revisions.map((revision) => {
      const review = reviews.find((r) => r.revisionId === revision.id);
      return {
        ...revisionSummary(revision),
        review: review
          ? {
              id: review.id,
              state: review.state,
              stale: review.stale,
              requestedBy: personOf(review.requestedBy),
              decidedBy: review.decidedBy ? personOf(review.decidedBy) : null,
              decidedAt: review.decidedAt?.toISOString() ?? null,
            }
          : null,
      };
    }),
    page: query.page,
    pageSize: query.pageSize,
    total: count,
  };
}
