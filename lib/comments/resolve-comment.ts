import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { recordAudit } from '@/lib/audit';
import { findComment } from '@/lib/comments/find-comment';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { personOf, type Person } from '@/lib/person';
import { User } from '@/models';

export interface CommentResolution {
  id: string;
  resolvedAt: string | null;
  resolvedBy: Person | null;
}

async function setResolved({ actor, commentId, resolved }: { actor: Actor; commentId: string; resolved: boolean }): Promise<CommentResolution> {
  return getSequelize().transaction(async (transaction) => {
    const comment = await findComment({ workspaceId: actor.workspaceId, commentId, transaction });
    if (comment.parentId) throw new AppError('invalid', 'comment', 'A thread is resolved or reopened as a whole, from its first comment');
    if (resolved === (comment.resolvedAt !== null)) throw new AppError('conflict', 'comment', resolved ? 'This thread is resolved already' : 'This thread is open already');
    const by = resolved ? await User.findByPk(actor.userId, { attributes: ['id', 'name'], transaction, rejectOnEmpty: true }) : null;
    await comment.update({ resolvedAt: by ? new Date() : null, resolvedById: by?.id ?? null }, { transaction });
    await recordAudit(
      { action: resolved ? 'comment.resolved' : 'comment.reopened', actorId: actor.userId, workspaceId: actor.workspaceId, targetType: 'comment', targetId: comment.id, data: { circuitId: comment.circuitId } },
      transaction,
    );
    return { id: comment.id, resolvedAt: comment.resolvedAt?.toISOString() ?? null, resolvedBy: by ? personOf(by) : null };
  });
}

export function resolveComment({ actor, commentId }: { actor: Actor; commentId: string }): Promise<CommentResolution> {
  return setResolved({ actor, commentId, resolved: true });
}

export function reopenComment({ actor, commentId }: { actor: Actor; commentId: string }): Promise<CommentResolution> {
  return setResolved({ actor, commentId, resolved: false });
}
