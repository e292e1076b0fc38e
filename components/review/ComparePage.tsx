'use client';

import { useQuery } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useCallback, useMemo, useState } from 'react';
import { requestJson } from '@/components/api/request-json';
import { ChangeTime } from '@/components/circuits/ChangeTime';
import { circuitKey } from '@/components/editor/CircuitEditorPage';
import type { RunFrame } from '@/components/editor/run/run-frame';
import { FormAlert } from '@/components/forms/FormAlert';
import { TabList } from '@/components/ui/TabList';
import { TextLink } from '@/components/ui/TextLink';
import type { CircuitDetail } from '@/lib/circuits/get-circuit';
import { ApprovalNote } from './ApprovalNote';
import { ChangeLegend } from './ChangeLegend';
import { ChangeTable } from './ChangeTable';
import { CommentsPanel } from './CommentsPanel';
import { marksOf, removedOf } from './diff-marks';
import { fetchCircuitReviews, fetchComments, fetchComparison, reviewKeys, type CommentAnchor } from './review-api';
import { ReviewPanel } from './ReviewPanel';
import { RevisionDrawing } from './RevisionDrawing';
import { SavedRuns } from './SavedRuns';

type Tab = 'changes' | 'review' | 'comments' | 'runs';
const TABS: ReadonlyArray<{ tab: Tab; label: string }> = [
  { tab: 'changes', label: 'Changes' },
  { tab: 'review', label: 'Review' },
  { tab: 'comments', label: 'Comments' },
  { tab: 'runs', label: 'Saved runs' },
];

/**
 * One revision against an earlier one: the later drawing with what changed marked on it and
 * listed, the review of the later revision, the comment threads pinned to its parts, and its
 * saved runs. Without `from`, the comparison starts at the last approved revision before `to`
 * (what the reviewer has not yet seen), or the one just before it.
 */
export function ComparePage({
  circuitId,
  from: fromParam,
  to: toParam,
  reviewId,
  commentId,
}: {
  circuitId: string;
  from?: number;
  to?: number;
  reviewId?: string;
  /** A thread to open the comments on (a mention's e-mail links here). */
  commentId?: string;
}) {
  const router = useRouter();
  const circuit = useQuery({ queryKey: circuitKey(circuitId), queryFn: ({ signal }) => requestJson<CircuitDetail>(`/api/circuits/${circuitId}`, signal) });
  const reviews = useQuery({ queryKey: reviewKeys.circuitReviews(circuitId), queryFn: ({ signal }) => fetchCircuitReviews(circuitId, signal) });
  const latest = circuit.data?.revision?.number;
  const to = toParam ?? latest;
  const from = useMemo(() => {
    if (fromParam !== undefined) return fromParam;
    if (to === undefined || !reviews.data) return undefined;
    const approved = reviews.data.items.filter((r) => r.state === 'approved' && r.revisionNumber < to).map((r) => r.revisionNumber);
    return approved.length ? Math.max(...approved) : Math.max(1, to - 1);
  }, [fromParam, reviews.data, to]);
  const comparison = useQuery({
    queryKey: reviewKeys.compare(circuitId, from ?? 0, to ?? 0),
    queryFn: ({ signal }) => fetchComparison(circuitId, from!, to!, signal),
    enabled: from !== undefined && to !== undefined,
  });
  const comments = useQuery({ queryKey: reviewKeys.comments(circuitId), queryFn: ({ signal }) => fetchComments(circuitId, signal) });
  const [tab, setTab] = useState<Tab>(commentId ? 'comments' : reviewId ? 'review' : 'changes');
  const [anchor, setAnchor] = useState<CommentAnchor>({ kind: 'circuit' });
  const [frame, setFrame] = useState<RunFrame | null>(null);
  const [runFocus, setRunFocus] = useState<{ runId: string; timeS: number } | undefined>(undefined);

  // The server reads both drawings through the schema before it compares them.
  const documents = useMemo(() => (comparison.data ? { before: comparison.data.from.document, after: comparison.data.to.document } : null), [comparison.data]);
  const same = from === to;
  const marks = useMemo(() => (comparison.data && !same ? marksOf(comparison.data.diff) : undefined), [comparison.data, same]);
  const removed = useMemo(() => (comparison.data && documents && !same ? removedOf(documents.before, comparison.data.diff) : undefined), [comparison.data, documents, same]);
  const threadCounts = useMemo(() => {
    const counts = new Map<string, number>();
    for (const t of comments.data?.threads ?? []) {
      if (t.resolvedAt) continue;
      const id = t.anchor.kind === 'component' ? t.anchor.componentId : t.anchor.kind === 'tube' ? t.anchor.tubeId : null;
      if (id) counts.set(id, (counts.get(id) ?? 0) + 1);
    }
    return counts;
  }, [comments.data]);

  const pick = useCallback((picked: CommentAnchor) => {
    setAnchor(picked);
    setTab('comments');
  }, []);
  const show = useCallback((shown: CommentAnchor) => {
    if (shown.kind === 'run') {
      setRunFocus({ runId: shown.runId, timeS: shown.timeS });
      setTab('runs');
    } else setAnchor(shown);
  }, []);
  const pinMoment = useCallback((moment: CommentAnchor) => {
    setAnchor(moment);
    setTab('comments');
  }, []);

  const goTo = (next: { from?: number; to?: number }) => {
    const params = new URLSearchParams({ from: String(next.from ?? from), to: String(next.to ?? to) });
    if (reviewId) params.set('review', reviewId);
    router.push(`/circuits/${circuitId}/compare?${params}`);
  };

  if (circuit.isError) return <FormAlert tone="error">{circuit.error.message}</FormAlert>;
  if (comparison.isError) return <FormAlert tone="error">{comparison.error.message}</FormAlert>;
  const numbers = latest ? Array.from({ length: latest }, (_, i) => latest - i) : [];

  return (
    <div className="flex flex-col gap-3 lg:h-[calc(100dvh-9rem)]" data-testid="compare-page">
      <header className="flex flex-wrap items-end justify-between gap-3">
        <div className="min-w-0">
          <p className="text-sm text-ink-soft">
            <TextLink href={`/circuits/${circuitId}`}>{circuit.data?.title ?? 'Circuit'}</TextLink> · <TextLink href={`/circuits/${circuitId}/history`}>Revisions</TextLink> · <TextLink href={`/circuits/${circuitId}/proofs`}>Rules and proofs</TextLink>
          </p>
          <h1 className="text-xl" data-testid="compare-heading">
            {same ? `Revision ${to}` : `Revision ${to}, against ${from}`}
          </h1>
          <ApprovalNote circuitId={circuitId} />
        </div>
        <div className="flex flex-wrap items-center gap-2 text-sm">
          <RevisionSelect label="Earlier" value={from} numbers={numbers} onPick={(n) => goTo({ from: n })} testId="compare-from" />
          <RevisionSelect label="Later" value={to} numbers={numbers} onPick={(n) => goTo({ to: n })} testId="compare-to" />
        </div>
      </header>
      {comparison.data ? (
        <p className="text-xs text-ink-soft">
          Revision {comparison.data.to.number}: “{comparison.data.to.message}” by {comparison.data.to.author.name}, <ChangeTime iso={comparison.data.to.createdAt} />
        </p>
      ) : null}
      <div className="flex min-h-0 flex-1 flex-col gap-3 lg:flex-row">
        {/* A set height on narrow screens: the drawing fills its box, and a box without a height has none to fill. */}
        <div className="flex h-[26rem] min-w-0 flex-col overflow-hidden rounded-lg border border-rule bg-paper-raised lg:h-auto lg:flex-1">
          <div className="min-h-0 flex-1">
            {documents ? (
              <RevisionDrawing document={documents.after} removed={removed} marks={marks} comments={threadCounts} picked={anchor} onPick={pick} frame={frame} />
            ) : (
              <div className="h-full animate-pulse bg-paper-sunk" aria-busy="true" aria-label="Loading the drawing" />
            )}
          </div>
          {!same ? <ChangeLegend /> : null}
        </div>
        <aside className="flex w-full shrink-0 flex-col overflow-hidden rounded-lg border border-rule bg-paper-raised lg:w-[26rem]" aria-label="Changes, review and comments">
          <TabList
            tabs={TABS.map((t) => ({
              id: t.tab,
              label:
                t.tab === 'comments' && comments.data ? (
                  <>
                    {t.label} <span className="text-xs text-ink-soft">({comments.data.threads.filter((x) => !x.resolvedAt).length})</span>
                  </>
                ) : (
                  t.label
                ),
            }))}
            current={tab}
            onPick={setTab}
            label="Panels"
            testIdPrefix="compare-tab"
            className="shrink-0 px-2"
          />
          <div className="min-h-0 flex-1 overflow-y-auto p-3" role="tabpanel">
            {tab === 'changes' ? (
              comparison.data && documents ? (
                same ? <p className="text-sm text-ink-soft">Pick an earlier revision to see what changed.</p> : <ChangeTable diff={comparison.data.diff} />
              ) : (
                <p className="text-sm text-ink-soft">Working out the changes…</p>
              )
            ) : null}
            {tab === 'review' && to !== undefined ? <ReviewPanel circuitId={circuitId} revisionNumber={to} newest={to === latest} focusReviewId={reviewId} /> : null}
            {tab === 'comments' && documents && to !== undefined ? (
              <CommentsPanel focusId={commentId} circuitId={circuitId} revisionNumber={to} document={documents.after} anchor={anchor} onClearAnchor={() => setAnchor({ kind: 'circuit' })} onShow={show} />
            ) : null}
            {/* Kept mounted while another panel shows, so a replay stays on the drawing. */}
            {documents && to !== undefined ? (
              <div hidden={tab !== 'runs'}>
                <SavedRuns key={runFocus ? `${runFocus.runId}@${runFocus.timeS}` : 'browse'} circuitId={circuitId} revisionNumber={to} document={documents.after} onFrame={setFrame} onPinMoment={pinMoment} focus={runFocus} />
              </div>
            ) : null}
          </div>
        </aside>
      </div>
    </div>
  );
}

function RevisionSelect({ label, value, numbers, onPick, testId }: { label: string; value: number | undefined; numbers: number[]; onPick: (n: number) => void; testId: string }) {
  return (
    <label className="flex items-center gap-1 text-ink-soft">
      {label}
      <select value={value ?? ''} onChange={(e) => onPick(Number(e.target.value))} className="h-8 rounded-md border border-rule bg-paper-raised px-1 text-ink" data-testid={testId}>
        {numbers.map((n) => (
          <option key={n} value={n}>
            {n}
          </option>
        ))}
      </select>
    </label>
  );
}
