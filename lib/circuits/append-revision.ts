import 'server-only';
import type { CircuitDocument } from '@/engine/document/schema';
import { recordAudit } from '@/lib/audit';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { markReviewsStale } from '@/lib/reviews/mark-reviews-stale';
import { Circuit, CircuitRevision } from '@/models';

/**
 * Appends a new revision to a circuit. The writer states the lock version it
 * read; if someone saved in between, nothing is written and `conflict:revision`
 * tells the writer to look at the newer revision first.
 */
export async function appendRevision({
  workspaceId,
  circuitId,
  authorId,
  document,
  message,
  expectedLockVersion,
  restoredFrom,
}: {
  workspaceId: string;
  circuitId: string;
  authorId: string;
  document: CircuitDocument;
  message: string;
  expectedLockVersion: number;
  /** Number of the revision whose document this one brings back, for the audit trail. */
  restoredFrom?: number;
}): Promise<{ id: string; number: number; lockVersion: number }> {
  return getSequelize().transaction(async (transaction) => {
    const circuit = await Circuit.findOne({ where: { id: circuitId, workspaceId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!circuit) throw new AppError('not_found', 'circuit', 'No such circuit in this workspace');
    if (circuit.lockVersion !== expectedLockVersion) {
      throw new AppError('conflict', 'revision', `Revision ${circuit.currentRevisionNumber} was saved meanwhile; open it and apply your change again`, 'expectedLockVersion');
    }
    const number = circuit.currentRevisionNumber + 1;
    const revision = await CircuitRevision.create({ circuitId, number, document, authorId, message }, { transaction });
    await circuit.update({ currentRevisionId: revision.id, currentRevisionNumber: number, lockVersion: circuit.lockVersion + 1 }, { transaction });
    await markReviewsStale({ circuitId, transaction });
    await recordAudit({ action: 'circuit.revised', actorId: authorId, workspaceId, targetType: 'circuit', targetId: circuitId, data: { number, restoredFrom } }, transaction);
    return { id: revision.id, number, lockVersion: circuit.lockVersion };
  });
}
