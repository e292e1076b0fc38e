'use client';

import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Button } from '@/components/ui/Button';
import { Pagination } from '@/components/ui/Pagination';
import { CircuitRow } from './CircuitRow';
import { CircuitTableSkeleton } from './CircuitTableSkeleton';
import {
  circuitListKey,
  fetchCircuits,
  type CircuitListQuery,
  type CircuitSortKey,
  type SortDirection,
} from './fetch-circuits';
import { SortableHeader } from './SortableHeader';

const PAGE_SIZE = 20;

type Column = {
  key: CircuitSortKey;
  label: string;
  /** Direction on first click: names read A to Z, counts and dates biggest or newest first. */
  firstDirection: SortDirection;
  numeric?: boolean;
  className?: string;
};

const columns: readonly Column[] = [
  { key: 'title', label: 'Title', firstDirection: 'asc', className: 'w-1/2' },
  { key: 'revisions', label: 'Revisions', firstDirection: 'desc', numeric: true },
  { key: 'updated', label: 'Last change', firstDirection: 'desc' },
  { key: 'author', label: 'Author', firstDirection: 'asc', className: 'hidden sm:table-cell' },
];

const directionWords: Record<SortDirection, string> = { asc: 'ascending', desc: 'descending' };

export function CircuitTable() {
  const [sort, setSort] = useState<{ key: CircuitSortKey; dir: SortDirection }>({
    key: 'updated',
    dir: 'desc',
  });
  const [page, setPage] = useState(1);
  const query: CircuitListQuery = { sort: sort.key, dir: sort.dir, page, pageSize: PAGE_SIZE };

  const { data, error, isPending, isPlaceholderData, refetch } = useQuery({
    queryKey: circuitListKey(query),
    queryFn: ({ signal }) => fetchCircuits(query, signal),
    // Keeps the current page on screen while the next one loads, instead of flashing a skeleton.
    placeholderData: keepPreviousData,
  });

  function sortBy(column: Column) {
    setSort((current) =>
      current.key === column.key
        ? { key: column.key, dir: current.dir === 'asc' ? 'desc' : 'asc' }
        : { key: column.key, dir: column.firstDirection },
    );
    setPage(1);
  }

  if (error && !data) {
    return (
      <div
        data-testid="circuit-error"
        className="rounded-lg border border-danger/40 bg-danger-soft px-4 py-4 text-sm text-ink"
      >
        <p className="font-medium text-danger">The circuit list could not be loaded.</p>
        <p className="mt-1">{error.message}</p>
        <Button size="sm" className="mt-3" onClick={() => void refetch()}>
          Try again
        </Button>
      </div>
    );
  }

  if (data && data.total === 0) {
    return (
      <div
        data-testid="circuit-empty"
        className="rounded-lg border border-dashed border-rule bg-paper-raised px-6 py-12 text-center"
      >
        <p className="font-medium text-ink">No circuits yet</p>
        <p className="mt-1 text-sm text-ink-soft">
          Circuits saved by engineers in this workspace will be listed here.
        </p>
      </div>
    );
  }

  const pageCount = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
  const activeColumn = columns.find((column) => column.key === sort.key);
  const busy = isPending || isPlaceholderData;

  return (
    <div className="space-y-4">
      <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
        <table
          data-testid="circuit-table"
          aria-busy={busy}
          className={`w-full border-collapse text-sm transition-opacity ${isPlaceholderData ? 'opacity-60' : ''}`}
        >
          <caption className="sr-only">
            Circuits in this workspace, sorted by {activeColumn?.label ?? sort.key},{' '}
            {directionWords[sort.dir]}
          </caption>
          <thead className="bg-paper-sunk">
            <tr>
              {columns.map((column) => (
                <SortableHeader
                  key={column.key}
                  label={column.label}
                  direction={sort.key === column.key ? sort.dir : null}
                  onSort={() => sortBy(column)}
                  numeric={column.numeric}
                  className={column.className}
                />
              ))}
            </tr>
          </thead>
          <tbody>
            {data ? (
              data.items.map((circuit) => <CircuitRow key={circuit.id} circuit={circuit} />)
            ) : (
              <CircuitTableSkeleton rows={5} />
            )}
          </tbody>
        </table>
      </div>

      {data ? (
        <div className="flex flex-wrap items-center justify-between gap-3">
          <p className="text-sm text-ink-soft">
            <span className="value text-ink">{data.total}</span>{' '}
            {data.total === 1 ? 'circuit' : 'circuits'}
          </p>
          <Pagination
            page={data.page}
            pageCount={pageCount}
            onPageChange={setPage}
            busy={busy}
            label="Circuit pages"
          />
        </div>
      ) : null}
    </div>
  );
}
