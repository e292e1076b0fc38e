import type { ChangeMark } from '@/components/editor/flow-mapping';
import type { DocumentDiff } from '@/engine/document/diff';
import type { CircuitDocument } from '@/engine/document/schema';
import type { DrawingMarks } from './RevisionDrawing';

/**
 * How each part, tube and wire of the later revision is marked on the drawing. Only what can
 * alter the circuit's behaviour counts as changed: a part that was merely moved or relabelled
 * is left unmarked, so the marks lead the reviewer to what matters.
 */
export function marksOf(diff: DocumentDiff): DrawingMarks {
  const mark = <T extends { id: string }>(added: readonly T[], changed: ReadonlyArray<T & { changes: ReadonlyArray<{ affects: string }> }>) => {
    const marks = new Map<string, ChangeMark>(added.map((a) => [a.id, 'added']));
    for (const c of changed) if (c.changes.some((x) => x.affects === 'behaviour')) marks.set(c.id, 'changed');
    return marks;
  };
  return {
    components: mark(diff.components.added, diff.components.changed),
    tubes: mark(diff.tubes.added, diff.tubes.changed),
    wires: mark(diff.wires.added, diff.wires.changed),
  };
}

/** What the earlier revision had and the later one lost, as a document to draw faded where it stood. */
export function removedOf(before: CircuitDocument, diff: DocumentDiff): CircuitDocument {
  const gone = (list: ReadonlyArray<{ id: string }>) => new Set(list.map((x) => x.id));
  const components = gone(diff.components.removed);
  const tubes = gone(diff.tubes.removed);
  const wires = gone(diff.wires.removed);
  return {
    ...before,
    components: before.components.filter((c) => components.has(c.id)),
    tubes: before.tubes.filter((t) => tubes.has(t.id)),
    wires: before.wires.filter((w) => wires.has(w.id)),
    links: [],
  };
}
