import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { can } from '@/lib/auth/policy';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { sendMail } from '@/lib/mail/mailer';
import { reviewDecidedMail } from '@/lib/mail/templates';
import { recordReviewEvent } from '@/lib/reviews/record-review-event';
import { findReview, reviewView, type LoadedReview, type ReviewView } from '@/lib/reviews/review-view';
import type { DecideReviewBody } from '@/lib/reviews/schemas';
import { ReviewRequestReviewer, User } from '@/models';

/** `conflict:review` unless the request can still be decided. */
function assertOpen(review: LoadedReview): void {
  if (review.state === 'withdrawn') throw new AppError('conflict', 'review', 'This review request was withdrawn');
  if (review.state !== 'requested') throw new AppError('conflict', 'review', 'This review request has already been decided');
  if (review.stale) {
    throw new AppError('conflict', 'review', `Revision ${review.revision.number} is no longer the newest; a review of the newest revision has to be requested`);
  }
}

/** Approves or asks for changes, as a reviewer named on the request (or someone who may manage reviews), and tells the requester. */
export async function decideReview({ actor, reviewId, input, now = new Date() }: { actor: Actor; reviewId: string; input: DecideReviewBody; now?: Date }): Promise<ReviewView> {
  return getSequelize().transaction(async (transaction) => {
    const review = await findReview({ workspaceId: actor.workspaceId, reviewId, transaction, forUpdate: true });
    const named = (await ReviewRequestReviewer.count({ where: { reviewRequestId: review.id, reviewerId: actor.userId }, transaction })) > 0;
    if (!named && !can(actor.role, 'review:manage')) throw new AppError('forbidden', 'review', 'Only a reviewer named on this request may decide it');
    assertOpen(review);

    const approved = input.decision === 'approve';
    const note = input.note || null;
    await review.update({ state: approved ? 'approved' : 'changes_requested', decidedById: actor.userId, decidedAt: now, decisionNote: note }, { transaction });
    await recordReviewEvent(
      { action: approved ? 'review.approved' : 'review.changes_requested', actor, reviewId: review.id, circuitId: review.circuitId, revisionNumber: review.revision.number },
      transaction,
    );
    const decider = await User.findByPk(actor.userId, { attributes: ['id', 'name'], transaction, rejectOnEmpty: true });
    const view = await reviewView(Object.assign(review, { decidedBy: decider }), transaction);
    const requester = await User.findByPk(review.requestedById, { attributes: ['email', 'name'], transaction, rejectOnEmpty: true });
    await sendMail(
      reviewDecidedMail({
        to: requester.email,
        requesterName: requester.name,
        deciderName: decider.name,
        decision: input.decision,
        note,
        circuitId: review.circuitId,
        circuitTitle: review.circuit.title,
        revisionNumber: review.revision.number,
        reviewId: review.id,
      }),
    );
    return view;
  });
}
