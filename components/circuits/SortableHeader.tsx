import type { SortDirection } from './fetch-circuits';

type SortableHeaderProps = {
  label: string;
  /** The direction this column is sorted in, or null when another column leads. */
  direction: SortDirection | null;
  onSort: () => void;
  numeric?: boolean;
  className?: string;
};

const ariaSort = { asc: 'ascending', desc: 'descending' } as const;

export function SortableHeader({ label, direction, onSort, numeric = false, className }: SortableHeaderProps) {
  return (
    <th
      scope="col"
      aria-sort={direction ? ariaSort[direction] : 'none'}
      className={['px-2 py-1.5 font-medium', numeric ? 'text-right' : 'text-left', className]
        .filter(Boolean)
        .join(' ')}
    >
      <button
        type="button"
        onClick={onSort}
        className={[
          'inline-flex items-center gap-1 rounded px-2 py-1 text-xs uppercase tracking-wide hover:bg-paper-sunk hover:text-ink',
          direction ? 'text-ink' : 'text-ink-soft',
          numeric ? 'flex-row-reverse' : '',
        ].join(' ')}
      >
        {label}
        <svg
          viewBox="0 0 12 12"
          aria-hidden="true"
          focusable="false"
          className={`size-3 ${direction ? 'text-accent' : 'text-ink-faint'}`}
          fill="none"
          stroke="currentColor"
          strokeWidth="1.5"
          strokeLinecap="round"
          strokeLinejoin="round"
        >
          {direction === 'asc' ? <path d="M6 10V2M3 5l3-3 3 3" /> : null}
          {direction === 'desc' ? <path d="M6 2v8M3 7l3 3 3-3" /> : null}
          {direction === null ? <path d="M3.5 4.5 6 2l2.5 2.5M3.5 7.5 6 10l2.5-2.5" /> : null}
        </svg>
      </button>
    </th>
  );
}
