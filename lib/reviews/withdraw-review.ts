import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { can } from '@/lib/auth/policy';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { recordReviewEvent } from '@/lib/reviews/record-review-event';
import { findReview, reviewView, type ReviewView } from '@/lib/reviews/review-view';

/** Takes back an undecided request; a stale one may be withdrawn too, to tidy the list. */
export async function withdrawReview({ actor, reviewId }: { actor: Actor; reviewId: string }): Promise<ReviewView> {
  return getSequelize().transaction(async (transaction) => {
    const review = await findReview({ workspaceId: actor.workspaceId, reviewId, transaction, forUpdate: true });
    if (review.requestedById !== actor.userId && !can(actor.role, 'review:manage')) {
      throw new AppError('forbidden', 'review', 'Only whoever asked for this review may withdraw it');
    }
    if (review.state !== 'requested') throw new AppError('conflict', 'review', review.state === 'withdrawn' ? 'This review request was already withdrawn' : 'This review request has already been decided');
    await review.update({ state: 'withdrawn' }, { transaction });
    await recordReviewEvent({ action: 'review.withdrawn', actor, reviewId: review.id, circuitId: review.circuitId, revisionNumber: review.revision.number }, transaction);
    return reviewView(review, transaction);
  });
}
