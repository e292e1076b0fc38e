import 'server-only';
import { diffDocuments, type DocumentDiff } from '@/engine/document/diff';
import { emptyDocument, type CircuitDocument } from '@/engine/document/schema';
import { documentOf, findCircuit, findRevision, revisionDetail, type RevisionDetail } from '@/lib/circuits/revision-view';
import { getSequelize } from '@/lib/db';

/** A revision with its drawing read through the schema. */
export type CheckedRevision = RevisionDetail & { document: CircuitDocument };

export interface RevisionComparison {
  /** Null only when `to` is the first revision and no `from` was asked for: it is compared with an empty sheet. */
  from: CheckedRevision | null;
  to: CheckedRevision;
  diff: DocumentDiff;
}

/** What changed from one revision to another; `to` defaults to the newest, `from` to the one before `to`. */
export async function compareRevisions({ workspaceId, circuitId, from, to }: { workspaceId: string; circuitId: string; from?: number; to?: number }): Promise<RevisionComparison> {
  getSequelize();
  const circuit = await findCircuit({ workspaceId, circuitId });
  const toNumber = to ?? circuit.currentRevisionNumber;
  const fromNumber = from ?? (toNumber > 1 ? toNumber - 1 : undefined);
  const after = await findRevision({ circuitId, number: toNumber, field: 'to' });
  const before = fromNumber === undefined ? null : await findRevision({ circuitId, number: fromNumber, field: 'from' });
  const afterDocument = documentOf(after, 'to');
  const beforeDocument = before ? documentOf(before, 'from') : emptyDocument();
  // The documents go out as read through the schema, the same ones the difference was taken of.
  return {
    from: before ? { ...revisionDetail(before), document: beforeDocument } : null,
    to: { ...revisionDetail(after), document: afterDocument },
    diff: diffDocuments(beforeDocument, afterDocument),
  };
}
