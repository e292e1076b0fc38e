'use client';

import { useMemo, useState } from 'react';
import type { DocumentDiff } from '@/engine/document/diff';
import { changeTableRows, type ChangeRow } from './change-table';
import { countOf } from '@/components/ui/count';

type SortKey = 'order' | 'tag';

/**
 * What changed between the two revisions, one row per value in the editor's units: what alters
 * behaviour first (or by tag, on request), then what only touches the drawing, which is folded
 * away until asked for.
 */
export function ChangeTable({ diff }: { diff: DocumentDiff }) {
  const [sort, setSort] = useState<SortKey>('order');
  const [showDrawing, setShowDrawing] = useState(false);
  const rows = useMemo(() => changeTableRows(diff), [diff]);
  const behaviour = rows.filter((r) => r.affects === 'behaviour');
  const drawing = rows.filter((r) => r.affects === 'drawing');
  const sorted = (list: ChangeRow[]) => (sort === 'tag' ? [...list].sort((a, b) => a.tag.localeCompare(b.tag, 'en', { numeric: true })) : list);
  const { summary } = diff;

  if (summary.isEmpty) return <p className="text-sm text-ink-soft">The two revisions are the same.</p>;
  return (
    <div className="space-y-2" data-testid="change-table">
      <p className="text-sm text-ink">
        {countOf(summary.components.added, 'part')} added, {countOf(summary.components.removed, 'part')} removed, {countOf(summary.components.changed, 'part')} changed;{' '}
        {countOf(summary.tubes.added + summary.tubes.removed + summary.tubes.changed, 'tube')} and {countOf(summary.wires.added + summary.wires.removed + summary.wires.changed, 'wire')} touched.
        {!summary.affectsBehaviour ? ' Only the drawing changed: the circuit behaves as before.' : ''}
      </p>
      <div className="flex items-center gap-2 text-xs text-ink-soft">
        Order
        <button type="button" onClick={() => setSort('order')} aria-pressed={sort === 'order'} className={sort === 'order' ? 'font-medium text-ink underline' : 'underline'}>
          parts, then lines
        </button>
        <button type="button" onClick={() => setSort('tag')} aria-pressed={sort === 'tag'} className={sort === 'tag' ? 'font-medium text-ink underline' : 'underline'} data-testid="change-sort-tag">
          by tag
        </button>
      </div>
      <Rows rows={sorted(behaviour)} caption="Changes that can alter what the circuit does" />
      {drawing.length ? (
        <div>
          <button type="button" onClick={() => setShowDrawing((s) => !s)} aria-expanded={showDrawing} className="text-xs text-accent underline">
            {showDrawing ? 'Hide' : 'Show'} {countOf(drawing.length, 'drawing-only change')}
          </button>
          {showDrawing ? <Rows rows={sorted(drawing)} caption="Changes to the drawing only" /> : null}
        </div>
      ) : null}
    </div>
  );
}

function Rows({ rows, caption }: { rows: ChangeRow[]; caption: string }) {
  if (rows.length === 0) return null;
  return (
    <table className="w-full text-sm">
      <caption className="mb-1 text-left text-xs font-medium text-ink-soft">{caption}</caption>
      <thead className="text-left text-xs text-ink-soft">
        <tr>
          <th scope="col" className="py-1 pr-2">
            Tag
          </th>
          <th scope="col" className="py-1 pr-2">
            What
          </th>
          <th scope="col" className="py-1 pr-2">
            Before
          </th>
          <th scope="col" className="py-1">
            After
          </th>
        </tr>
      </thead>
      <tbody>
        {rows.map((row, i) => (
          <tr key={`${row.tag}-${row.what}-${i}`} className="border-t border-rule align-top" data-testid="change-row" data-tag={row.tag}>
            <td className="value py-1 pr-2 text-ink">{row.tag || '—'}</td>
            <td className="py-1 pr-2 text-ink">{row.what}</td>
            <td className="value py-1 pr-2 text-ink-soft">{row.before}</td>
            <td className={`value py-1 ${row.after === 'added' ? 'text-accent-strong' : row.after === 'removed' ? 'text-ink-soft line-through' : 'text-ink'}`}>{row.after}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

