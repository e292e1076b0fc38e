import 'server-only';
import { emptyDocument } from '@/engine/document/schema';
import { recordAudit } from '@/lib/audit';
import { getSequelize } from '@/lib/db';
import type { CreateCircuitBody } from '@/lib/circuits/schemas';
import { Circuit, CircuitRevision } from '@/models';

export interface CreatedCircuit {
  id: string;
  title: string;
  revision: { id: string; number: number };
}

/** Creates a circuit with its first revision in one transaction. */
export async function createCircuit({
  workspaceId,
  authorId,
  input,
}: {
  workspaceId: string;
  authorId: string;
  input: CreateCircuitBody;
}): Promise<CreatedCircuit> {
  const sequelize = getSequelize();
  return sequelize.transaction(async (transaction) => {
    const circuit = await Circuit.create(
      { workspaceId, title: input.title, description: input.description, createdById: authorId, currentRevisionId: null },
      { transaction },
    );
    const revision = await CircuitRevision.create(
      { circuitId: circuit.id, number: 1, document: input.document ?? emptyDocument(), authorId, message: input.message },
      { transaction },
    );
    await circuit.update({ currentRevisionId: revision.id, currentRevisionNumber: 1, lockVersion: 1 }, { transaction });
    await recordAudit(
      { action: 'circuit.created', actorId: authorId, workspaceId, targetType: 'circuit', targetId: circuit.id },
      transaction,
    );
    return { id: circuit.id, title: circuit.title, revision: { id: revision.id, number: revision.number } };
  });
}
