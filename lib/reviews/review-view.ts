import 'server-only';
import type { Includeable, Transaction } from 'sequelize';
import { AppError } from '@/lib/errors';
import { personOf, type Person } from '@/lib/person';
import { Circuit, CircuitRevision, ReviewRequest, ReviewRequestReviewer, User, type ReviewState } from '@/models';

export interface ReviewView {
  id: string;
  circuit: { id: string; title: string };
  revisionNumber: number;
  state: ReviewState;
  stale: boolean;
  message: string;
  requestedBy: Person;
  reviewers: Person[];
  createdAt: string;
  decidedBy: Person | null;
  decidedAt: string | null;
  decisionNote: string | null;
}

export type LoadedReview = ReviewRequest & { circuit: Circuit; revision: CircuitRevision; requestedBy: User; decidedBy: User | null };

/** What a review view needs; the required circuit join keeps every query inside one workspace. */
export function reviewIncludes(workspaceId: string): Includeable[] {
  return [
    { model: Circuit, as: 'circuit', attributes: ['id', 'title'], where: { workspaceId }, required: true },
    { model: CircuitRevision, as: 'revision', attributes: ['id', 'number'] },
    { model: User, as: 'requestedBy', attributes: ['id', 'name'] },
    { model: User, as: 'decidedBy', attributes: ['id', 'name'] },
  ];
}

type ReviewerLink = ReviewRequestReviewer & { reviewer: User };

async function reviewerLinks(reviewIds: string[], transaction?: Transaction): Promise<ReviewerLink[]> {
  return (await ReviewRequestReviewer.findAll({
    where: { reviewRequestId: reviewIds },
    include: [{ model: User, as: 'reviewer', attributes: ['id', 'name'] }],
    order: [[{ model: User, as: 'reviewer' }, 'name', 'ASC'], ['reviewerId', 'ASC']],
    transaction,
  })) as ReviewerLink[];
}

function shape(review: LoadedReview, links: ReviewerLink[]): ReviewView {
  return {
    id: review.id,
    circuit: { id: review.circuit.id, title: review.circuit.title },
    revisionNumber: review.revision.number,
    state: review.state,
    stale: review.stale,
    message: review.message,
    requestedBy: personOf(review.requestedBy),
    reviewers: links.filter((l) => l.reviewRequestId === review.id).map((l) => personOf(l.reviewer)),
    createdAt: review.createdAt.toISOString(),
    decidedBy: review.decidedBy ? personOf(review.decidedBy) : null,
    decidedAt: review.decidedAt?.toISOString() ?? null,
    decisionNote: review.decisionNote,
  };
}

/** Shapes loaded requests, fetching the reviewers of all of them in one query. */
export async function reviewViews(reviews: LoadedReview[], transaction?: Transaction): Promise<ReviewView[]> {
  if (reviews.length === 0) return [];
  const links = await reviewerLinks(reviews.map((r) => r.id), transaction);
  return reviews.map((review) => shape(review, links));
}

export async function reviewView(review: LoadedReview, transaction?: Transaction): Promise<ReviewView> {
  return shape(review, await reviewerLinks([review.id], transaction));
}

/**
 * One request of the workspace with what its view needs; `not_found:review` otherwise.
 * With `forUpdate`, its row stays locked until the transaction ends.
 */
export async function findReview({ workspaceId, reviewId, transaction, forUpdate = false }: { workspaceId: string; reviewId: string; transaction: Transaction; forUpdate?: boolean }): Promise<LoadedReview> {
  const review = (await ReviewRequest.findOne({
    where: { id: reviewId },
    include: reviewIncludes(workspaceId),
    transaction,
    lock: forUpdate ? { level: transaction.LOCK.UPDATE, of: ReviewRequest } : undefined,
  })) as LoadedReview | null;
  if (!review) throw new AppError('not_found', 'review', 'No such review request in this workspace');
  return review;
}
