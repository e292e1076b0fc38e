import Link from 'next/link';
import { ChangeTime } from './ChangeTime';
import type { CircuitSummary } from './fetch-circuits';

export function CircuitRow({ circuit }: { circuit: CircuitSummary }) {
  const authorName = circuit.author?.name;

  return (
    <tr data-testid="circuit-row" className="border-t border-rule align-top hover:bg-paper-sunk/60">
      <th scope="row" className="px-4 py-3 text-left font-normal">
        <Link href={`/circuits/${circuit.id}`} className="block font-medium text-ink underline-offset-2 hover:text-accent-strong hover:underline" data-testid="circuit-link">
          {circuit.title}
        </Link>
        {circuit.description ? (
          <span className="mt-0.5 line-clamp-2 text-xs text-ink-soft">{circuit.description}</span>
        ) : null}
        {/* The author column is hidden on narrow screens, so the name moves under the title. */}
        <span className="mt-1 block text-xs text-ink-soft sm:hidden">
          {authorName ? `by ${authorName}` : 'Author unknown'}
        </span>
      </th>
      <td className="value px-4 py-3 text-right text-ink">{circuit.revisionCount}</td>
      <td className="px-4 py-3 text-ink-soft">
        <ChangeTime iso={circuit.updatedAt} />
      </td>
      <td className="hidden px-4 py-3 text-ink-soft sm:table-cell">
        {authorName ?? (
          <>
            <span aria-hidden="true">—</span>
            <span className="sr-only">Author unknown</span>
          </>
        )}
      </td>
    </tr>
  );
}
