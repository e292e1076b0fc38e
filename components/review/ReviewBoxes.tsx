'use client';

import { keepPreviousData, useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { useState } from 'react';
import { ChangeTime } from '@/components/circuits/ChangeTime';
import { FormAlert } from '@/components/forms/FormAlert';
import { Pagination } from '@/components/ui/Pagination';
import { TabList } from '@/components/ui/TabList';
import { fetchReviewBox, reviewKeys, reviewStateLabel, type ReviewItem } from './review-api';

type Box = 'waiting' | 'requested';

const BOXES: ReadonlyArray<{ box: Box; label: string; empty: string }> = [
  { box: 'waiting', label: 'Waiting for me', empty: 'Nothing waits for your review.' },
  { box: 'requested', label: 'I asked for', empty: 'You have not asked anyone for a review yet.' },
];

/** The reviews that wait for me, and those I asked others for. */
export function ReviewBoxes() {
  const [box, setBox] = useState<Box>('waiting');
  const [page, setPage] = useState(1);
  const list = useQuery({ queryKey: reviewKeys.box(box, page), queryFn: ({ signal }) => fetchReviewBox(box, page, signal), placeholderData: keepPreviousData });
  const current = BOXES.find((b) => b.box === box)!;
  const pageCount = list.data ? Math.max(1, Math.ceil(list.data.total / list.data.pageSize)) : 1;

  return (
    <section className="space-y-4" aria-labelledby="reviews-heading">
      <h1 id="reviews-heading" className="text-xl">
        Reviews
      </h1>
      <TabList
        tabs={BOXES.map((b) => ({ id: b.box, label: b.label }))}
        current={box}
        onPick={(picked) => {
          setBox(picked);
          setPage(1);
        }}
        label="Which reviews"
        testIdPrefix="review-box"
      />
      {list.isError ? <FormAlert tone="error">{list.error.message}</FormAlert> : null}
      {list.isPending ? <p className="text-sm text-ink-soft">Loading…</p> : null}
      {list.data && list.data.items.length === 0 ? <p className="text-sm text-ink-soft">{current.empty}</p> : null}
      <ul className="space-y-2" data-testid="review-list">
        {(list.data?.items ?? []).map((item) => (
          <ReviewCard key={item.id} item={item} />
        ))}
      </ul>
      {list.data && pageCount > 1 ? <Pagination page={page} pageCount={pageCount} onPageChange={setPage} busy={list.isFetching} label="Review pages" /> : null}
    </section>
  );
}

function ReviewCard({ item }: { item: ReviewItem }) {
  const href = `/circuits/${item.circuit.id}/compare?to=${item.revisionNumber}&review=${item.id}`;
  return (
    <li className="rounded-lg border border-rule bg-paper-raised px-4 py-3" data-testid="review-item">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <Link href={href} className="font-medium text-ink underline-offset-2 hover:text-accent-strong hover:underline" data-testid="review-link">
          {item.circuit.title} · revision {item.revisionNumber}
        </Link>
        <span className="text-xs text-ink-soft" data-testid="review-state">
          {reviewStateLabel(item)}
        </span>
      </div>
      <p className="mt-1 text-sm text-ink">{item.message}</p>
      <p className="mt-1 text-xs text-ink-soft">
        Asked by {item.requestedBy.name} of {item.reviewers.map((r) => r.name).join(', ')}, <ChangeTime iso={item.createdAt} />
        {item.decidedBy && item.decidedAt ? (
          <>
            {' '}
            · decided by {item.decidedBy.name}, <ChangeTime iso={item.decidedAt} />
          </>
        ) : null}
      </p>
      {item.decisionNote ? <p className="mt-1 border-l-2 border-rule pl-2 text-sm whitespace-pre-wrap text-ink-soft">{item.decisionNote}</p> : null}
    </li>
  );
}
