const titleWidths = ['w-48', 'w-36', 'w-56', 'w-40', 'w-44'] as const;

/** Placeholder rows shaped like real ones, so the table does not jump when data arrives. */
export function CircuitTableSkeleton({ rows }: { rows: number }) {
  return (
    <>
      {Array.from({ length: rows }, (_, index) => (
        <tr key={index} aria-hidden="true" className="border-t border-rule">
          <td className="px-4 py-3">
            <div className={`h-4 max-w-full animate-pulse rounded bg-paper-sunk ${titleWidths[index % titleWidths.length]}`} />
            <div className="mt-2 h-3 w-64 max-w-full animate-pulse rounded bg-paper-sunk" />
          </td>
          <td className="px-4 py-3">
            <div className="ml-auto h-4 w-6 animate-pulse rounded bg-paper-sunk" />
          </td>
          <td className="px-4 py-3">
            <div className="h-4 w-20 animate-pulse rounded bg-paper-sunk" />
          </td>
          <td className="hidden px-4 py-3 sm:table-cell">
            <div className="h-4 w-24 animate-pulse rounded bg-paper-sunk" />
          </td>
        </tr>
      ))}
      <tr className="sr-only">
        <td colSpan={4}>Loading circuits…</td>
      </tr>
    </>
  );
}
