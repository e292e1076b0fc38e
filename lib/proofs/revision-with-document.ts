import 'server-only';
import type { Transaction } from 'sequelize';
import type { CircuitDocument } from '@/engine/document/schema';
import { documentOf, findCircuit, findRevision, type RevisionWithAuthor } from '@/lib/circuits/revision-view';

/** A circuit's revision by number, or its newest when no number is given, with its drawing read through the schema. */
export async function revisionWithDocument({
  workspaceId,
  circuitId,
  number,
  transaction,
}: {
  workspaceId: string;
  circuitId: string;
  number?: number;
  transaction?: Transaction;
}): Promise<{ revision: RevisionWithAuthor; document: CircuitDocument }> {
  const circuit = await findCircuit({ workspaceId, circuitId, transaction });
  const revision = await findRevision({ circuitId, number: number ?? circuit.currentRevisionNumber, field: 'revisionNumber', transaction });
  return { revision, document: documentOf(revision, 'revisionNumber') };
}
