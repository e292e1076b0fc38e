import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { findComment } from '@/lib/comments/find-comment';
import { mailMentions } from '@/lib/comments/mail-mentions';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';

export interface EditedComment {
  id: string;
  body: string;
  editedAt: string | null;
}

/** Changes a comment's body; only its author may. Members newly mentioned by the change are e-mailed. */
export async function editComment({ actor, commentId, body }: { actor: Actor; commentId: string; body: string }): Promise<EditedComment> {
  const { comment, previousBody } = await getSequelize().transaction(async (transaction) => {
    const comment = await findComment({ workspaceId: actor.workspaceId, commentId, transaction });
    if (comment.authorId !== actor.userId) throw new AppError('forbidden', 'comment', 'Only the author of a comment can change it');
    const previousBody = comment.body;
    if (body !== previousBody) await comment.update({ body, editedAt: new Date() }, { transaction });
    return { comment, previousBody };
  });
  if (comment.body !== previousBody) {
    await mailMentions({ workspaceId: actor.workspaceId, circuit: comment.circuit, commentId: comment.id, authorId: actor.userId, body: comment.body, previousBody });
  }
  return { id: comment.id, body: comment.body, editedAt: comment.editedAt?.toISOString() ?? null };
}
