import 'server-only';
import type { Transaction } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { Circuit, Comment } from '@/models';

export type CommentOnCircuit = Comment & { circuit: Circuit };

/** A comment on a circuit of the workspace, locked for the transaction; `not_found:comment` otherwise. */
export async function findComment({ workspaceId, commentId, transaction }: { workspaceId: string; commentId: string; transaction: Transaction }): Promise<CommentOnCircuit> {
  getSequelize();
  const comment = (await Comment.findOne({
    where: { id: commentId },
    include: [{ model: Circuit, as: 'circuit', attributes: ['id', 'title', 'workspaceId'], where: { workspaceId } }],
    transaction,
    lock: { level: transaction.LOCK.UPDATE, of: Comment },
  })) as CommentOnCircuit | null;
  if (!comment) throw new AppError('not_found', 'comment', 'No such comment in this workspace');
  return comment;
}
