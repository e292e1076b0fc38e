'use client';

import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { requestJson } from '@/components/api/request-json';
import { ChangeTime } from '@/components/circuits/ChangeTime';
import { circuitKey } from '@/components/editor/CircuitEditorPage';
import { FormAlert } from '@/components/forms/FormAlert';
import { Button } from '@/components/ui/Button';
import { ButtonLink } from '@/components/ui/ButtonLink';
import { Pagination } from '@/components/ui/Pagination';
import { TextLink } from '@/components/ui/TextLink';
import { useCan } from '@/components/workspace/use-current-workspace';
import type { CircuitDetail } from '@/lib/circuits/get-circuit';
import { ApprovalNote } from './ApprovalNote';
import { fetchRevisions, restoreRevision, reviewKeys, reviewStateLabel } from './review-api';

/**
 * Every revision of a circuit, newest first: who saved it, why, and where its review stands.
 * Two revisions can be picked to compare; an engineer can bring an old one back as a new revision.
 */
export function RevisionHistory({ circuitId }: { circuitId: string }) {
  const queryClient = useQueryClient();
  const canEdit = useCan('circuit:edit');
  const [page, setPage] = useState(1);
  const [picked, setPicked] = useState<number[]>([]);
  const [notice, setNotice] = useState<string | null>(null);
  const circuit = useQuery({ queryKey: circuitKey(circuitId), queryFn: ({ signal }) => requestJson<CircuitDetail>(`/api/circuits/${circuitId}`, signal) });
  const revisions = useQuery({ queryKey: reviewKeys.revisions(circuitId, page), queryFn: ({ signal }) => fetchRevisions(circuitId, page, signal), placeholderData: keepPreviousData });
  const restore = useMutation({
    mutationFn: (number: number) => restoreRevision(circuitId, number, circuit.data!.lockVersion),
    onSuccess: (saved, number) => {
      setNotice(`Revision ${number} is back as revision ${saved.number}.`);
      void queryClient.invalidateQueries({ queryKey: ['circuits', circuitId] });
      void queryClient.invalidateQueries({ queryKey: circuitKey(circuitId) });
    },
  });

  const toggle = (number: number) =>
    setPicked((now) => (now.includes(number) ? now.filter((n) => n !== number) : [...now, number].slice(-2)));
  const [from, to] = [...picked].sort((a, b) => a - b);

  if (revisions.isError) return <FormAlert tone="error">{revisions.error.message}</FormAlert>;
  const data = revisions.data;
  const pageCount = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;

  return (
    <section className="space-y-4" aria-labelledby="history-heading">
      <header className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <p className="text-sm text-ink-soft">
            <TextLink href={`/circuits/${circuitId}`}>{circuit.data?.title ?? 'Circuit'}</TextLink>
          </p>
          <h1 id="history-heading" className="text-xl">
            Revisions and reviews
          </h1>
          <ApprovalNote circuitId={circuitId} />
        </div>
        <div className="flex flex-wrap items-center gap-2">
          <span className="text-sm text-ink-soft">{picked.length === 2 ? `Revisions ${from} and ${to} picked` : 'Pick two revisions to compare them'}</span>
          <ButtonLink
            href={picked.length === 2 ? `/circuits/${circuitId}/compare?from=${from}&to=${to}` : '#'}
            aria-disabled={picked.length !== 2}
            className={picked.length === 2 ? '' : 'pointer-events-none opacity-50'}
            size="sm"
            data-testid="compare-picked"
          >
            Compare
          </ButtonLink>
        </div>
      </header>
      {notice ? <FormAlert tone="success">{notice}</FormAlert> : null}
      {restore.isError ? <FormAlert tone="error">{restore.error.message}</FormAlert> : null}
      <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
        <table className="w-full text-sm" data-testid="revision-table">
          <caption className="sr-only">Revisions of this circuit, newest first</caption>
          <thead className="bg-paper-sunk text-left text-xs text-ink-soft">
            <tr>
              <th scope="col" className="w-10 px-3 py-2">
                <span className="sr-only">Pick</span>
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                No.
              </th>
              <th scope="col" className="px-3 py-2">
                What changed
              </th>
              <th scope="col" className="hidden px-3 py-2 sm:table-cell">
                By
              </th>
              <th scope="col" className="px-3 py-2">
                Saved
              </th>
              <th scope="col" className="px-3 py-2">
                Review
              </th>
              <th scope="col" className="px-3 py-2">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {(data?.items ?? []).map((revision) => (
              <tr key={revision.id} className="border-t border-rule align-top" data-testid="revision-row" data-number={revision.number}>
                <td className="px-3 py-2">
                  <input
                    type="checkbox"
                    checked={picked.includes(revision.number)}
                    onChange={() => toggle(revision.number)}
                    aria-label={`Pick revision ${revision.number} to compare`}
                    data-testid="revision-pick"
                  />
                </td>
                <td className="value px-3 py-2 text-right text-ink">{revision.number}</td>
                <td className="px-3 py-2 text-ink">
                  {revision.message || <span className="text-ink-faint">no message</span>}
                  <span className="mt-0.5 block text-xs text-ink-soft sm:hidden">by {revision.author.name}</span>
                </td>
                <td className="hidden px-3 py-2 text-ink-soft sm:table-cell">{revision.author.name}</td>
                <td className="px-3 py-2 text-ink-soft">
                  <ChangeTime iso={revision.createdAt} />
                </td>
                <td className="px-3 py-2" data-testid="revision-review">
                  {revision.review ? (
                    <span className={revision.review.state === 'approved' && !revision.review.stale ? 'font-medium text-accent-strong' : 'text-ink-soft'}>
                      {reviewStateLabel(revision.review)}
                      {revision.review.decidedBy ? ` · ${revision.review.decidedBy.name}` : ''}
                    </span>
                  ) : (
                    <span className="text-ink-faint">—</span>
                  )}
                </td>
                <td className="space-x-2 whitespace-nowrap px-3 py-2 text-right">
                  <TextLink href={`/circuits/${circuitId}/compare?from=${revision.number}&to=${revision.number}`} data-testid="revision-view">
                    View
                  </TextLink>
                  {revision.number > 1 ? (
                    <TextLink href={`/circuits/${circuitId}/compare?from=${revision.number - 1}&to=${revision.number}`} data-testid="revision-changes">
                      Changes
                    </TextLink>
                  ) : null}
                  {canEdit && circuit.data?.revision && revision.number !== circuit.data.revision.number ? (
                    <Button size="sm" variant="quiet" onClick={() => restore.mutate(revision.number)} disabled={restore.isPending} data-testid="revision-restore">
                      Restore
                    </Button>
                  ) : null}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
        {revisions.isPending ? <p className="px-3 py-6 text-center text-sm text-ink-soft">Loading the revisions…</p> : null}
      </div>
      {data && pageCount > 1 ? <Pagination page={page} pageCount={pageCount} onPageChange={setPage} busy={revisions.isFetching} label="Revision pages" /> : null}
    </section>
  );
}
