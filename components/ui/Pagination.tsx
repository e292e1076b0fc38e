import { Button } from './Button';

type PaginationProps = {
  page: number;
  pageCount: number;
  onPageChange: (page: number) => void;
  /** While a page is loading, both buttons wait so clicks cannot queue up. */
  busy?: boolean;
  label: string;
};

export function Pagination({ page, pageCount, onPageChange, busy = false, label }: PaginationProps) {
  return (
    <nav aria-label={label} className="flex items-center gap-3">
      <Button
        size="sm"
        onClick={() => onPageChange(page - 1)}
        disabled={busy || page <= 1}
        data-testid="pagination-previous"
      >
        Previous
      </Button>
      <span className="text-sm text-ink-soft" aria-live="polite" data-testid="pagination-status">
        Page <span className="value text-ink">{page}</span> of{' '}
        <span className="value text-ink">{pageCount}</span>
      </span>
      <Button
        size="sm"
        onClick={() => onPageChange(page + 1)}
        disabled={busy || page >= pageCount}
        data-testid="pagination-next"
      >
        Next
      </Button>
    </nav>
  );
}
