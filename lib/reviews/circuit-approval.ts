import 'server-only';
import { personOf, type Person } from '@/lib/person';
import { CircuitRevision, ReviewRequest, User } from '@/models';

export interface CircuitApproval {
  revisionNumber: number;
  decidedBy: Person;
  decidedAt: string;
}

/** The approval that still holds: the latest approved request not made stale by a newer revision. */
export async function findCircuitApproval({ circuitId }: { circuitId: string }): Promise<CircuitApproval | null> {
  const approval = (await ReviewRequest.findOne({
    where: { circuitId, state: 'approved', stale: false },
    include: [
      { model: CircuitRevision, as: 'revision', attributes: ['id', 'number'] },
      { model: User, as: 'decidedBy', attributes: ['id', 'name'] },
    ],
    order: [['decidedAt', 'DESC'], ['id', 'ASC']],
  })) as (ReviewRequest & { revision: CircuitRevision; decidedBy: User }) | null;
  if (!approval?.decidedAt) return null;
  return { revisionNumber: approval.revision.number, decidedBy: personOf(approval.decidedBy), decidedAt: approval.decidedAt.toISOString() };
}
