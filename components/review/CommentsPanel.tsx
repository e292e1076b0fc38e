'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useSession } from 'next-auth/react';
import { useState } from 'react';
import { ChangeTime } from '@/components/circuits/ChangeTime';
import { FormAlert } from '@/components/forms/FormAlert';
import { Button } from '@/components/ui/Button';
import { useCan } from '@/components/workspace/use-current-workspace';
import type { CircuitDocument } from '@/engine/document/schema';
import { editComment, fetchComments, postComment, reviewKeys, setCommentResolved, type CommentAnchor, type CommentReply, type CommentThread } from './review-api';

/** The words for where a thread is pinned, with the part's tag where the drawing has it. */
function anchorLabel(anchor: CommentAnchor, document: CircuitDocument): string {
  switch (anchor.kind) {
    case 'circuit':
      return 'the whole circuit';
    case 'component':
      return document.components.find((c) => c.id === anchor.componentId)?.tag ?? 'a part no longer drawn';
    case 'tube': {
      const tube = document.tubes.find((t) => t.id === anchor.tubeId);
      const tag = (id: string) => document.components.find((c) => c.id === id)?.tag ?? '?';
      return tube ? `the tube ${tag(tube.from.component)} ${tube.from.port} – ${tag(tube.to.component)} ${tube.to.port}` : 'a tube no longer drawn';
    }
    case 'run':
      return `a saved run at t = ${anchor.timeS.toFixed(2)} s`;
  }
}

/**
 * The comment threads of a circuit, pinned to parts, tubes, the circuit or a moment of a saved
 * run. Bodies are plain text and shown as text. A new thread is pinned to what is picked on the
 * drawing (or to the run moment on show).
 */
export function CommentsPanel({
  circuitId,
  revisionNumber,
  document,
  anchor,
  onClearAnchor,
  onShow,
  focusId,
}: {
  /** A comment to bring into view, with its thread marked. */
  focusId?: string;
  circuitId: string;
  revisionNumber: number;
  document: CircuitDocument;
  anchor: CommentAnchor;
  onClearAnchor: () => void;
  onShow: (anchor: CommentAnchor) => void;
}) {
  const queryClient = useQueryClient();
  const canComment = useCan('comment:create');
  const comments = useQuery({ queryKey: reviewKeys.comments(circuitId), queryFn: ({ signal }) => fetchComments(circuitId, signal) });
  const refresh = () => void queryClient.invalidateQueries({ queryKey: reviewKeys.comments(circuitId) });
  const [body, setBody] = useState('');
  const post = useMutation({
    mutationFn: () => postComment(circuitId, { revisionNumber, anchor, body }),
    onSuccess: () => {
      setBody('');
      refresh();
    },
  });
  const threads = comments.data?.threads ?? [];
  const open = threads.filter((t) => !t.resolvedAt);
  const resolved = threads.filter((t) => t.resolvedAt);

  return (
    <div className="space-y-3" data-testid="comments-panel">
      {canComment ? (
        <form
          className="space-y-1.5"
          onSubmit={(event) => {
            event.preventDefault();
            post.mutate();
          }}
        >
          <p className="text-xs text-ink-soft">
            New comment on <span className="font-medium text-ink" data-testid="comment-anchor">{anchorLabel(anchor, document)}</span>
            {anchor.kind !== 'circuit' ? (
              <button type="button" onClick={onClearAnchor} className="ml-2 text-accent underline">
                pin to the whole circuit instead
              </button>
            ) : (
              <span> — click a part or a tube on the drawing to pin it there</span>
            )}
          </p>
          <textarea
            value={body}
            onChange={(e) => setBody(e.target.value)}
            rows={3}
            maxLength={4000}
            placeholder="Plain text; @name tells a member by e-mail"
            className="block w-full rounded-md border border-rule bg-paper-raised px-2 py-1 text-sm text-ink"
            aria-label="Comment"
            data-testid="comment-body"
          />
          {post.isError ? <FormAlert tone="error">{post.error.message}</FormAlert> : null}
          <Button type="submit" size="sm" disabled={post.isPending || body.trim() === ''} data-testid="comment-post">
            Add the comment
          </Button>
        </form>
      ) : null}
      {comments.isError ? <FormAlert tone="error">{comments.error.message}</FormAlert> : null}
      {threads.length === 0 && comments.data ? <p className="text-sm text-ink-soft">No comments yet.</p> : null}
      <ul className="space-y-2" data-testid="comment-threads">
        {open.map((t) => (
          <Thread focused={t.id === focusId || t.replies.some((r) => r.id === focusId)} key={t.id} thread={t} circuitId={circuitId} revisionNumber={revisionNumber} document={document} canComment={canComment} onChanged={refresh} onShow={onShow} />
        ))}
      </ul>
      {resolved.length ? (
        <details>
          <summary className="text-xs text-ink-soft">Resolved ({resolved.length})</summary>
          <ul className="mt-2 space-y-2">
            {resolved.map((t) => (
              <Thread focused={t.id === focusId || t.replies.some((r) => r.id === focusId)} key={t.id} thread={t} circuitId={circuitId} revisionNumber={revisionNumber} document={document} canComment={canComment} onChanged={refresh} onShow={onShow} />
            ))}
          </ul>
        </details>
      ) : null}
    </div>
  );
}

function Thread({
  thread,
  circuitId,
  revisionNumber,
  document,
  canComment,
  onChanged,
  onShow,
  focused,
}: {
  focused: boolean;
  thread: CommentThread;
  circuitId: string;
  revisionNumber: number;
  document: CircuitDocument;
  canComment: boolean;
  onChanged: () => void;
  onShow: (anchor: CommentAnchor) => void;
}) {
  const [reply, setReply] = useState('');
  const answer = useMutation({
    mutationFn: () => postComment(circuitId, { revisionNumber, anchor: thread.anchor, body: reply, parentId: thread.id }),
    onSuccess: () => {
      setReply('');
      onChanged();
    },
  });
  const resolve = useMutation({ mutationFn: () => setCommentResolved(thread.id, !thread.resolvedAt), onSuccess: onChanged });
  return (
    <li
      ref={focused ? (el) => el?.scrollIntoView({ block: 'nearest' }) : undefined}
      className={`rounded-md border px-3 py-2 ${focused ? 'border-accent ring-2 ring-accent/30' : 'border-rule'}`}
      data-testid="comment-thread"
      data-focused={focused || undefined}
      data-resolved={thread.resolvedAt ? true : undefined}
    >
      <button type="button" onClick={() => onShow(thread.anchor)} className="text-xs font-medium text-accent underline-offset-2 hover:underline" data-testid="comment-thread-anchor">
        {anchorLabel(thread.anchor, document)}
      </button>
      <span className="text-xs text-ink-soft"> · revision {thread.revisionNumber}</span>
      <Entry entry={thread} onChanged={onChanged} />
      {thread.replies.map((r) => (
        <div key={r.id} className="ml-3 border-l-2 border-rule pl-2">
          <Entry entry={r} onChanged={onChanged} />
        </div>
      ))}
      {thread.resolvedAt && thread.resolvedBy ? (
        <p className="mt-1 text-xs text-ink-soft">
          Resolved by {thread.resolvedBy.name}, <ChangeTime iso={thread.resolvedAt} />
        </p>
      ) : null}
      {canComment ? (
        <div className="mt-2 space-y-1">
          {!thread.resolvedAt ? (
            <form
              className="flex gap-1"
              onSubmit={(event) => {
                event.preventDefault();
                answer.mutate();
              }}
            >
              <input
                value={reply}
                onChange={(e) => setReply(e.target.value)}
                maxLength={4000}
                placeholder="Reply"
                aria-label="Reply"
                className="h-8 min-w-0 flex-1 rounded-md border border-rule bg-paper-raised px-2 text-sm text-ink"
                data-testid="comment-reply"
              />
              <Button type="submit" size="sm" variant="secondary" disabled={answer.isPending || reply.trim() === ''} data-testid="comment-reply-send">
                Reply
              </Button>
            </form>
          ) : null}
          <Button size="sm" variant="quiet" onClick={() => resolve.mutate()} disabled={resolve.isPending} data-testid="comment-resolve">
            {thread.resolvedAt ? 'Reopen' : 'Mark resolved'}
          </Button>
          {answer.isError ? <FormAlert tone="error">{answer.error.message}</FormAlert> : null}
          {resolve.isError ? <FormAlert tone="error">{resolve.error.message}</FormAlert> : null}
        </div>
      ) : null}
    </li>
  );
}

/** One comment: author, time, text (as text, never markup), and editing for its author. */
function Entry({ entry, onChanged }: { entry: CommentReply; onChanged: () => void }) {
  const me = useSession().data?.user?.id;
  const [editing, setEditing] = useState<string | null>(null);
  const save = useMutation({
    mutationFn: () => editComment(entry.id, editing ?? ''),
    onSuccess: () => {
      setEditing(null);
      onChanged();
    },
  });
  return (
    <div className="mt-1" data-testid="comment-entry">
      <p className="text-xs text-ink-soft">
        <span className="font-medium text-ink">{entry.author.name}</span>, <ChangeTime iso={entry.createdAt} />
        {entry.editedAt ? ' · edited' : ''}
        {entry.author.id === me && editing === null ? (
          <button type="button" onClick={() => setEditing(entry.body)} className="ml-2 text-accent underline" data-testid="comment-edit">
            edit
          </button>
        ) : null}
      </p>
      {editing === null ? (
        <p className="text-sm whitespace-pre-wrap text-ink" data-testid="comment-text">
          {entry.body}
        </p>
      ) : (
        <form
          className="space-y-1"
          onSubmit={(event) => {
            event.preventDefault();
            save.mutate();
          }}
        >
          <textarea value={editing} onChange={(e) => setEditing(e.target.value)} rows={2} maxLength={4000} aria-label="Edit the comment" className="block w-full rounded-md border border-rule bg-paper-raised px-2 py-1 text-sm text-ink" />
          <div className="flex gap-1">
            <Button type="submit" size="sm" disabled={save.isPending || editing.trim() === ''}>
              Save
            </Button>
            <Button size="sm" variant="quiet" onClick={() => setEditing(null)}>
              Cancel
            </Button>
          </div>
          {save.isError ? <FormAlert tone="error">{save.error.message}</FormAlert> : null}
        </form>
      )}
    </div>
  );
}
