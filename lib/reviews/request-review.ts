import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { can } from '@/lib/auth/policy';
import { findRevision } from '@/lib/circuits/revision-view';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { sendMail } from '@/lib/mail/mailer';
import { reviewRequestedMail } from '@/lib/mail/templates';
import { recordReviewEvent } from '@/lib/reviews/record-review-event';
import type { RequestReviewBody } from '@/lib/reviews/schemas';
import { Circuit, Membership, ReviewRequest, ReviewRequestReviewer, User } from '@/models';

function unfitReviewer(message: string): AppError {
  return new AppError('invalid', 'reviewerIds', `reviewerIds: ${message}`, 'reviewerIds');
}

/**
 * Asks the named members to review the circuit's newest revision and e-mails each
 * of them. An older revision is refused: it would be stale from the start.
 */
export async function requestReview({ actor, circuitId, input }: { actor: Actor; circuitId: string; input: RequestReviewBody }): Promise<{ id: string }> {
  return getSequelize().transaction(async (transaction) => {
    // FOR SHARE makes a concurrent save wait, so its staleness sweep sees this request.
    const circuit = await Circuit.findOne({ where: { id: circuitId, workspaceId: actor.workspaceId }, transaction, lock: transaction.LOCK.SHARE });
    if (!circuit) throw new AppError('not_found', 'circuit', 'No such circuit in this workspace');
    const revision = await findRevision({ circuitId, number: input.revisionNumber, field: 'revisionNumber', transaction });
    if (revision.number !== circuit.currentRevisionNumber) {
      throw new AppError('conflict', 'revision', `Revision ${circuit.currentRevisionNumber} is newer; ask for a review of that one`, 'revisionNumber');
    }
    if (input.reviewerIds.includes(actor.userId)) throw unfitReviewer('ask someone other than yourself');

    const memberships = (await Membership.findAll({
      where: { workspaceId: actor.workspaceId, userId: input.reviewerIds },
      include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }],
      transaction,
    })) as Array<Membership & { user: User }>;
    const reviewers = input.reviewerIds.map((id) => {
      const membership = memberships.find((m) => m.userId === id);
      if (!membership) throw unfitReviewer(`${id} is not a member of this workspace`);
      if (!can(membership.role, 'review:decide')) throw unfitReviewer(`${membership.user.name} is ${membership.role} here and may not decide reviews`);
      return membership.user;
    });

    const review = await ReviewRequest.create(
      { circuitId, revisionId: revision.id, requestedById: actor.userId, message: input.message },
      { transaction },
    );
    await ReviewRequestReviewer.bulkCreate(
      reviewers.map((r) => ({ reviewRequestId: review.id, reviewerId: r.id })),
      { transaction },
    );
    await recordReviewEvent(
      { action: 'review.requested', actor, reviewId: review.id, circuitId, revisionNumber: revision.number, extra: { reviewerIds: input.reviewerIds } },
      transaction,
    );
    const requester = await User.findByPk(actor.userId, { attributes: ['name'], transaction, rejectOnEmpty: true });
    // Inside the transaction: if the mail server refuses, no request is left that a reviewer never heard of.
    for (const reviewer of reviewers) {
      await sendMail(
        reviewRequestedMail({
          to: reviewer.email,
          reviewerName: reviewer.name,
          requesterName: requester.name,
          message: input.message,
          circuitId,
          circuitTitle: circuit.title,
          revisionNumber: revision.number,
          reviewId: review.id,
        }),
      );
    }
    return { id: review.id };
  });
}
