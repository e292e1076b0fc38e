import 'server-only';
import type { Transaction } from 'sequelize';
import { ReviewRequest } from '@/models';

/**
 * Called in the transaction that saves a new revision: every approval and every
 * undecided request of the circuit is then about an older revision. An approval
 * stops counting; an undecided request can no longer be decided, since its
 * reviewers would be judging a drawing the circuit no longer holds.
 */
export async function markReviewsStale({ circuitId, now = new Date(), transaction }: { circuitId: string; now?: Date; transaction: Transaction }): Promise<void> {
  await ReviewRequest.update(
    { stale: true, staleAt: now },
    { where: { circuitId, stale: false, state: ['requested', 'approved'] }, transaction },
  );
}
