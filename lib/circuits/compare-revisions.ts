import 'server-only';
import { diffDocuments, type DocumentDiff } from '@/engine/document/diff';
import { circuitDocumentSchema, emptyDocument } from '@/engine/document/schema';
import { findCircuit, findRevision, revisionDetail, type RevisionDetail } from '@/lib/circuits/revision-view';
import { getSequelize } from '@/lib/db';

export interface RevisionComparison {
  /** Null only when `to` is the first revision and no `from` was asked for: it is compared with an empty sheet. */
  from: RevisionDetail | null;
  to: RevisionDetail;
  diff: DocumentDiff;
}

/** What changed from one revision to another; `to` defaults to the newest, `from` to the one before `to`. */
export async function compareRevisions({ workspaceId, circuitId, from, to }: { workspaceId: string; circuitId: string; from?: number; to?: number }): Promise<RevisionComparison> {
  getSequelize();
  const circuit = await findCircuit({ workspaceId, circuitId });
  const toNumber = to ?? circuit.currentRevisionNumber;
  const fromNumber = from ?? (toNumber > 1 ? toNumber - 1 : undefined);
  const after = revisionDetail(await findRevision({ circuitId, number: toNumber, field: 'to' }));
  const before = fromNumber === undefined ? null : revisionDetail(await findRevision({ circuitId, number: fromNumber, field: 'from' }));
  // Read through the schema so that fields given defaults since a revision was saved are filled in.
  const diff = diffDocuments(before ? circuitDocumentSchema.parse(before.document) : emptyDocument(), circuitDocumentSchema.parse(after.document));
  return { from: before, to: after, diff };
}
