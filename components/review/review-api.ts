import { requestJson, sendJson } from '@/components/api/request-json';
import type { InputEvent } from '@/engine/solver/simulate';
import type { Trace } from '@/engine/trace/trace';
import type { CheckedRevision, RevisionComparison } from '@/lib/circuits/compare-revisions';
import type { ReviewView } from '@/lib/reviews/review-view';
import type { ReviewDecision } from '@/lib/reviews/schemas';
import type { RevisionReview, RevisionPage } from '@/lib/circuits/list-revisions';
import type { ReviewPage } from '@/lib/reviews/list-reviews';
import type { CommentAnchor } from '@/models/comment';
import type { CommentThread } from '@/lib/comments/list-comments';
import type { RunListItem } from '@/lib/runs/list-runs';

// Types only: the shapes come from the server modules, so the pages and the routes cannot drift apart.
export type { ReviewView as ReviewItem } from '@/lib/reviews/review-view';
export type { CommentAnchor } from '@/models/comment';
export type { CommentReply, CommentThread } from '@/lib/comments/list-comments';

/** The comparison as the page reads it: both revisions (it always names both) and what changed. */
export type Comparison = Omit<RevisionComparison, 'from'> & { from: CheckedRevision };

export const reviewKeys = {
  revisions: (circuitId: string, page: number) => ['circuits', circuitId, 'revisions', page] as const,
  compare: (circuitId: string, from: number, to: number) => ['circuits', circuitId, 'compare', from, to] as const,
  circuitReviews: (circuitId: string) => ['circuits', circuitId, 'reviews'] as const,
  comments: (circuitId: string) => ['circuits', circuitId, 'comments'] as const,
  runs: (circuitId: string) => ['circuits', circuitId, 'runs'] as const,
  trace: (runId: string) => ['runs', runId, 'trace'] as const,
  box: (box: 'waiting' | 'requested', page: number) => ['reviews', box, page] as const,
};

const circuitBase = (circuitId: string) => `/api/circuits/${encodeURIComponent(circuitId)}`;

export const fetchRevisions = (circuitId: string, page: number, signal: AbortSignal) =>
  requestJson<RevisionPage>(`${circuitBase(circuitId)}/revisions?page=${page}&pageSize=20`, signal);

export const fetchComparison = (circuitId: string, from: number, to: number, signal: AbortSignal) =>
  requestJson<Comparison>(`${circuitBase(circuitId)}/compare?from=${from}&to=${to}`, signal);

export const fetchCircuitReviews = (circuitId: string, signal: AbortSignal) => requestJson<{ items: ReviewView[] }>(`${circuitBase(circuitId)}/reviews`, signal);

export const fetchReviewBox = (box: 'waiting' | 'requested', page: number, signal: AbortSignal) =>
  requestJson<ReviewPage>(`/api/reviews?box=${box}&page=${page}&pageSize=20`, signal);

export const fetchComments = (circuitId: string, signal: AbortSignal) => requestJson<{ threads: CommentThread[] }>(`${circuitBase(circuitId)}/comments`, signal);

export const fetchSavedRuns = (circuitId: string, signal: AbortSignal) => requestJson<{ items: RunListItem[] }>(`${circuitBase(circuitId)}/runs`, signal);

export const fetchRunTrace = (runId: string, signal: AbortSignal) => requestJson<Trace>(`/api/runs/${encodeURIComponent(runId)}/trace`, signal);

export const restoreRevision = (circuitId: string, number: number, expectedLockVersion: number) =>
  sendJson<{ id: string; number: number; lockVersion: number }>('POST', `${circuitBase(circuitId)}/revisions/${number}/restore`, { expectedLockVersion, message: `Restored revision ${number}` });

export const requestReview = (circuitId: string, body: { revisionNumber: number; reviewerIds: string[]; message: string }) =>
  sendJson<{ id: string }>('POST', `${circuitBase(circuitId)}/reviews`, body);

export const decideReview = (reviewId: string, decision: ReviewDecision, note: string) =>
  sendJson<unknown>('POST', `/api/reviews/${encodeURIComponent(reviewId)}/decision`, { decision, ...(note ? { note } : {}) });

export const withdrawReview = (reviewId: string) => sendJson<unknown>('POST', `/api/reviews/${encodeURIComponent(reviewId)}/withdraw`);

export const postComment = (circuitId: string, body: { revisionNumber: number; anchor: CommentAnchor; body: string; parentId?: string }) =>
  sendJson<{ id: string }>('POST', `${circuitBase(circuitId)}/comments`, body);

export const editComment = (commentId: string, body: string) => sendJson<unknown>('PATCH', `/api/comments/${encodeURIComponent(commentId)}`, { body });

export const setCommentResolved = (commentId: string, resolved: boolean) =>
  sendJson<unknown>('POST', `/api/comments/${encodeURIComponent(commentId)}/${resolved ? 'resolve' : 'reopen'}`);

export const saveRun = (circuitId: string, body: { revisionNumber: number; inputs: InputEvent[]; untilS: number; name?: string }) =>
  sendJson<{ id: string }>('POST', `${circuitBase(circuitId)}/runs`, body);

/** How a review's state reads to people. */
export function reviewStateLabel(review: Pick<RevisionReview, 'state' | 'stale'>): string {
  if (review.stale) return review.state === 'approved' ? 'approval outdated' : 'outdated';
  return { requested: 'waiting for review', approved: 'approved', changes_requested: 'changes asked for', withdrawn: 'withdrawn' }[review.state];
}
