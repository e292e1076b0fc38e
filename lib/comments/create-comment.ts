import 'server-only';
import type { Transaction } from 'sequelize';
import type { CircuitDocument } from '@/engine/document/schema';
import type { Actor } from '@/lib/auth/actor';
import { findCircuit, findRevision } from '@/lib/circuits/revision-view';
import { mailMentions } from '@/lib/comments/mail-mentions';
import type { CreateCommentBody } from '@/lib/comments/schemas';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { runUntilS } from '@/lib/runs/get-run';
import { CircuitRevision, Comment, Run } from '@/models';
import type { CommentAnchor } from '@/models/comment';

interface Place {
  revisionId: string | null;
  anchor: CommentAnchor;
}

function badAnchor(message: string): AppError {
  return new AppError('invalid', 'anchor', message, 'anchor');
}

/** Checks that what the anchor names is there: in the revision's drawing, or a saved run of the circuit and a moment of it. */
async function checkAnchor({ anchor, revision, circuitId, transaction }: { anchor: CommentAnchor; revision: CircuitRevision; circuitId: string; transaction: Transaction }): Promise<void> {
  // Stored documents were validated when saved, with their lists filled in.
  const document = revision.document as Pick<CircuitDocument, 'components' | 'tubes'>;
  switch (anchor.kind) {
    case 'circuit':
      return;
    case 'component':
      if (!document.components.some((c) => c.id === anchor.componentId)) throw badAnchor(`Revision ${revision.number} has no component ${anchor.componentId}`);
      return;
    case 'tube':
      if (!document.tubes.some((t) => t.id === anchor.tubeId)) throw badAnchor(`Revision ${revision.number} has no tube ${anchor.tubeId}`);
      return;
    case 'run': {
      const run = await Run.findOne({
        where: { id: anchor.runId, kind: 'live' },
        include: [{ model: CircuitRevision, as: 'revision', attributes: [], where: { circuitId } }],
        transaction,
      });
      if (!run) throw badAnchor('No saved run of this circuit has that id');
      if (anchor.timeS > runUntilS(run)) throw badAnchor(`The run lasts ${runUntilS(run)} s: pin the comment to a moment within it`);
      return;
    }
  }
}

/** Where a new comment goes: a reply where its thread is, a new thread where it says. */
async function placeOf({ input, circuitId, transaction }: { input: CreateCommentBody; circuitId: string; transaction: Transaction }): Promise<Place> {
  if (input.parentId) {
    const parent = await Comment.findOne({ where: { id: input.parentId, circuitId }, transaction });
    if (!parent) throw new AppError('not_found', 'comment', 'No such comment on this circuit', 'parentId');
    if (parent.parentId) throw new AppError('invalid', 'parentId', 'Answer in the thread: a reply cannot have replies of its own', 'parentId');
    return { revisionId: parent.revisionId, anchor: parent.anchor };
  }
  // The schema requires both for a new thread.
  const revision = await findRevision({ circuitId, number: input.revisionNumber!, field: 'revisionNumber', transaction });
  await checkAnchor({ anchor: input.anchor!, revision, circuitId, transaction });
  return { revisionId: revision.id, anchor: input.anchor! };
}

/** Adds a comment (a new thread or a reply), then e-mails whoever it mentions. */
export async function createComment({ actor, circuitId, input }: { actor: Actor; circuitId: string; input: CreateCommentBody }): Promise<{ id: string }> {
  const { comment, circuit } = await getSequelize().transaction(async (transaction) => {
    const circuit = await findCircuit({ workspaceId: actor.workspaceId, circuitId, transaction });
    const place = await placeOf({ input, circuitId, transaction });
    const comment = await Comment.create(
      { circuitId, ...place, parentId: input.parentId ?? null, authorId: actor.userId, body: input.body, resolvedAt: null, resolvedById: null, editedAt: null },
      { transaction },
    );
    return { comment, circuit };
  });
  await mailMentions({ workspaceId: actor.workspaceId, circuit, commentId: comment.id, authorId: actor.userId, body: comment.body });
  return { id: comment.id };
}
