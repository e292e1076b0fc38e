import 'server-only';
import { Op } from 'sequelize';
import type { Actor } from '@/lib/auth/actor';
import { findCircuit } from '@/lib/circuits/revision-view';
import { getSequelize } from '@/lib/db';
import { reviewIncludes, reviewViews, type LoadedReview, type ReviewView } from '@/lib/reviews/review-view';
import type { ListReviewsQuery } from '@/lib/reviews/schemas';
import { ReviewRequest } from '@/models';

export interface ReviewPage {
  items: ReviewView[];
  page: number;
  pageSize: number;
  total: number;
}

/**
 * One page of the actor's reviews in the active workspace, newest first.
 * `waiting` holds only requests that can still be decided: not decided, withdrawn or stale.
 */
export async function listReviews({ actor, query }: { actor: Actor; query: ListReviewsQuery }): Promise<ReviewPage> {
  const sequelize = getSequelize();
  const where =
    query.box === 'waiting'
      ? {
          state: 'requested',
          stale: false,
          id: { [Op.in]: sequelize.literal(`(select review_request_id from review_request_reviewers where reviewer_id = ${sequelize.escape(actor.userId)})`) },
        }
      : { requestedById: actor.userId };
  const { rows, count } = await ReviewRequest.findAndCountAll({
    where,
    include: reviewIncludes(actor.workspaceId),
    order: [['createdAt', 'DESC'], ['id', 'ASC']],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  return { items: await reviewViews(rows as LoadedReview[]), page: query.page, pageSize: query.pageSize, total: count };
}

/** Every review request of one circuit, newest first. */
export async function listCircuitReviews({ workspaceId, circuitId }: { workspaceId: string; circuitId: string }): Promise<{ items: ReviewView[] }> {
  getSequelize();
  await findCircuit({ workspaceId, circuitId });
  const rows = await ReviewRequest.findAll({
    where: { circuitId },
    include: reviewIncludes(workspaceId),
    order: [['createdAt', 'DESC'], ['id', 'ASC']],
  });
  return { items: await reviewViews(rows as LoadedReview[]) };
}
