'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useSession } from 'next-auth/react';
import { useState } from 'react';
import { ChangeTime } from '@/components/circuits/ChangeTime';
import { circuitKey } from '@/components/editor/CircuitEditorPage';
import { FormAlert } from '@/components/forms/FormAlert';
import { fetchMembers, membersKey } from '@/components/members/members-api';
import { Button } from '@/components/ui/Button';
import { useCan } from '@/components/workspace/use-current-workspace';
import type { ReviewDecision } from '@/lib/reviews/schemas';
import { decideReview, fetchCircuitReviews, requestReview, reviewKeys, reviewStateLabel, withdrawReview, type ReviewItem } from './review-api';

/**
 * Where the review of one revision stands, and what the reader may do about it: an engineer asks
 * reviewers (with a message), a requested reviewer approves or asks for changes (with a note),
 * the one who asked may withdraw.
 */
export function ReviewPanel({
  circuitId,
  revisionNumber,
  newest,
  focusReviewId,
}: {
  circuitId: string;
  revisionNumber: number;
  /** Only the newest revision can be put up for review: an older one would be outdated from the start. */
  newest: boolean;
  focusReviewId?: string;
}) {
  const queryClient = useQueryClient();
  const me = useSession().data?.user?.id;
  const canRequest = useCan('review:request');
  const canDecide = useCan('review:decide');
  const reviews = useQuery({ queryKey: reviewKeys.circuitReviews(circuitId), queryFn: ({ signal }) => fetchCircuitReviews(circuitId, signal) });
  const refresh = () => {
    void queryClient.invalidateQueries({ queryKey: reviewKeys.circuitReviews(circuitId) });
    void queryClient.invalidateQueries({ queryKey: ['circuits', circuitId] });
    void queryClient.invalidateQueries({ queryKey: circuitKey(circuitId) });
    void queryClient.invalidateQueries({ queryKey: ['reviews'] });
  };
  const ofThisRevision = (reviews.data?.items ?? []).filter((r) => r.revisionNumber === revisionNumber);
  const focused = ofThisRevision.find((r) => r.id === focusReviewId) ?? ofThisRevision[0];

  return (
    <div className="space-y-3" data-testid="review-panel">
      {reviews.isError ? <FormAlert tone="error">{reviews.error.message}</FormAlert> : null}
      {focused ? <ReviewCard review={focused} me={me} canDecide={canDecide} onChanged={refresh} /> : <p className="text-sm text-ink-soft">No one has been asked to review revision {revisionNumber} yet.</p>}
      {canRequest && newest && (!focused || focused.state !== 'requested' || focused.stale) ? <RequestForm circuitId={circuitId} revisionNumber={revisionNumber} onDone={refresh} /> : null}
      {canRequest && !newest ? <p className="text-xs text-ink-soft">A review is asked for the newest revision; revision {revisionNumber} has been followed by others.</p> : null}
      {ofThisRevision.length > 1 ? (
        <details className="text-xs text-ink-soft">
          <summary>Earlier requests for this revision ({ofThisRevision.length - 1})</summary>
          <ul className="mt-1 space-y-1">
            {ofThisRevision
              .filter((r) => r.id !== focused?.id)
              .map((r) => (
                <li key={r.id}>
                  {reviewStateLabel(r)} · asked by {r.requestedBy.name}, <ChangeTime iso={r.createdAt} />
                </li>
              ))}
          </ul>
        </details>
      ) : null}
    </div>
  );
}

function ReviewCard({ review, me, canDecide, onChanged }: { review: ReviewItem; me: string | undefined; canDecide: boolean; onChanged: () => void }) {
  const [note, setNote] = useState('');
  const decide = useMutation({ mutationFn: (decision: ReviewDecision) => decideReview(review.id, decision, note.trim()), onSuccess: onChanged });
  const withdraw = useMutation({ mutationFn: () => withdrawReview(review.id), onSuccess: onChanged });
  const open = review.state === 'requested' && !review.stale;
  const mine = review.reviewers.some((r) => r.id === me);
  return (
    <article className="rounded-md border border-rule px-3 py-2" data-testid="review-card" data-state={review.state} data-stale={review.stale || undefined}>
      <p className="text-sm">
        <span className="font-medium text-ink" data-testid="review-card-state">
          {reviewStateLabel(review)}
        </span>
        <span className="text-ink-soft">
          {' '}
          · asked by {review.requestedBy.name} of {review.reviewers.map((r) => r.name).join(', ')}, <ChangeTime iso={review.createdAt} />
        </span>
      </p>
      {review.message ? <p className="mt-1 whitespace-pre-wrap text-sm text-ink">{review.message}</p> : null}
      {review.decidedBy && review.decidedAt ? (
        <p className="mt-1 text-xs text-ink-soft">
          Decided by {review.decidedBy.name}, <ChangeTime iso={review.decidedAt} />
        </p>
      ) : null}
      {review.decisionNote ? <p className="mt-1 border-l-2 border-rule pl-2 text-sm whitespace-pre-wrap text-ink-soft">{review.decisionNote}</p> : null}
      {open && canDecide && mine ? (
        <div className="mt-2 space-y-2">
          <label className="block text-xs text-ink-soft">
            Note to the engineer (optional)
            <textarea value={note} onChange={(e) => setNote(e.target.value)} rows={2} maxLength={2000} className="mt-0.5 block w-full rounded-md border border-rule bg-paper-raised px-2 py-1 text-sm text-ink" data-testid="review-note" />
          </label>
          <div className="flex flex-wrap gap-2">
            <Button size="sm" onClick={() => decide.mutate('approve')} disabled={decide.isPending} data-testid="review-approve">
              Approve this revision
            </Button>
            <Button size="sm" variant="secondary" onClick={() => decide.mutate('request_changes')} disabled={decide.isPending} data-testid="review-request-changes">
              Ask for changes
            </Button>
          </div>
          {decide.isError ? <FormAlert tone="error">{decide.error.message}</FormAlert> : null}
        </div>
      ) : null}
      {open && review.requestedBy.id === me ? (
        <Button size="sm" variant="quiet" className="mt-2" onClick={() => withdraw.mutate()} disabled={withdraw.isPending} data-testid="review-withdraw">
          Withdraw the request
        </Button>
      ) : null}
    </article>
  );
}

function RequestForm({ circuitId, revisionNumber, onDone }: { circuitId: string; revisionNumber: number; onDone: () => void }) {
  const members = useQuery({ queryKey: membersKey, queryFn: ({ signal }) => fetchMembers(signal) });
  const [chosen, setChosen] = useState<string[]>([]);
  const [message, setMessage] = useState('');
  const send = useMutation({
    mutationFn: () => requestReview(circuitId, { revisionNumber, reviewerIds: chosen, message: message.trim() }),
    onSuccess: () => {
      setChosen([]);
      setMessage('');
      onDone();
    },
  });
  const candidates = (members.data?.members ?? []).filter((m) => m.role === 'reviewer' || m.role === 'owner');
  return (
    <form
      className="space-y-2 rounded-md border border-dashed border-rule px-3 py-2"
      onSubmit={(event) => {
        event.preventDefault();
        send.mutate();
      }}
      data-testid="review-request-form"
    >
      <h3 className="text-sm font-medium text-ink">Ask for a review of revision {revisionNumber}</h3>
      <fieldset>
        <legend className="text-xs text-ink-soft">Reviewers (members with the reviewer or owner role)</legend>
        {candidates.length === 0 ? <p className="text-xs text-ink-soft">This workspace has no reviewer yet.</p> : null}
        {candidates.map((m) => (
          <label key={m.userId} className="mt-1 flex items-center gap-2 text-sm text-ink">
            <input
              type="checkbox"
              checked={chosen.includes(m.userId)}
              onChange={() => setChosen((c) => (c.includes(m.userId) ? c.filter((id) => id !== m.userId) : [...c, m.userId]))}
              data-testid="review-reviewer"
              data-email={m.email}
            />
            {m.name} <span className="text-xs text-ink-soft">({m.role})</span>
          </label>
        ))}
      </fieldset>
      <label className="block text-xs text-ink-soft">
        What should they look at?
        <textarea value={message} onChange={(e) => setMessage(e.target.value)} rows={2} maxLength={2000} className="mt-0.5 block w-full rounded-md border border-rule bg-paper-raised px-2 py-1 text-sm text-ink" data-testid="review-message" />
      </label>
      {send.isError ? <FormAlert tone="error">{send.error.message}</FormAlert> : null}
      <Button type="submit" size="sm" disabled={send.isPending || chosen.length === 0} data-testid="review-send">
        Send the request
      </Button>
    </form>
  );
}
