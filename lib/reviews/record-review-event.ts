import 'server-only';
import type { Transaction } from 'sequelize';
import type { Actor } from '@/lib/auth/actor';
import { recordAudit } from '@/lib/audit';

export type ReviewEvent = 'review.requested' | 'review.approved' | 'review.changes_requested' | 'review.withdrawn';

/** Audits a step of a review request; every event names the circuit and revision it is about. */
export async function recordReviewEvent(
  { action, actor, reviewId, circuitId, revisionNumber, extra = {} }: { action: ReviewEvent; actor: Actor; reviewId: string; circuitId: string; revisionNumber: number; extra?: Record<string, unknown> },
  transaction: Transaction,
): Promise<void> {
  await recordAudit(
    { action, actorId: actor.userId, workspaceId: actor.workspaceId, targetType: 'review_request', targetId: reviewId, data: { circuitId, revisionNumber, ...extra } },
    transaction,
  );
}
