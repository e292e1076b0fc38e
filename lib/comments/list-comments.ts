import 'server-only';
import { findCircuit } from '@/lib/circuits/revision-view';
import { getSequelize } from '@/lib/db';
import { personOf, type Person } from '@/lib/person';
import { CircuitRevision, Comment, User } from '@/models';
import type { CommentAnchor } from '@/models/comment';

export interface CommentReply {
  id: string;
  body: string;
  author: Person;
  createdAt: string;
  editedAt: string | null;
}

export interface CommentThread extends CommentReply {
  anchor: CommentAnchor;
  revisionNumber: number;
  resolvedAt: string | null;
  resolvedBy: Person | null;
  replies: CommentReply[];
}

type CommentRow = Comment & { revision: CircuitRevision; author: User; resolvedBy: User | null };

function replyView(c: CommentRow): CommentReply {
  return { id: c.id, body: c.body, author: personOf(c.author), createdAt: c.createdAt.toISOString(), editedAt: c.editedAt?.toISOString() ?? null };
}

/** A circuit's threads with their replies, oldest first; of one revision when a number is given. */
export async function listComments({ workspaceId, circuitId, revisionNumber }: { workspaceId: string; circuitId: string; revisionNumber?: number }): Promise<CommentThread[]> {
  getSequelize();
  await findCircuit({ workspaceId, circuitId });
  const rows = (await Comment.findAll({
    where: { circuitId },
    include: [
      { model: CircuitRevision, as: 'revision', attributes: ['number'], required: true, where: revisionNumber === undefined ? undefined : { number: revisionNumber } },
      { model: User, as: 'author', attributes: ['id', 'name'] },
      { model: User, as: 'resolvedBy', attributes: ['id', 'name'] },
    ],
    order: [
      ['createdAt', 'ASC'],
      ['id', 'ASC'],
    ],
  })) as CommentRow[];
  const threads = new Map<string, CommentThread>();
  for (const c of rows) {
    if (c.parentId) continue;
    threads.set(c.id, {
      ...replyView(c),
      anchor: c.anchor,
      revisionNumber: c.revision.number,
      resolvedAt: c.resolvedAt?.toISOString() ?? null,
      resolvedBy: c.resolvedBy ? personOf(c.resolvedBy) : null,
      replies: [],
    });
  }
  for (const c of rows) if (c.parentId) threads.get(c.parentId)?.replies.push(replyView(c));
  return [...threads.values()];
}
