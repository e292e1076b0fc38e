import 'server-only';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { findCircuitApproval, type CircuitApproval } from '@/lib/reviews/circuit-approval';
import { Circuit, CircuitRevision, User } from '@/models';

export interface CircuitDetail {
  id: string;
  title: string;
  description: string;
  lockVersion: number;
  updatedAt: string;
  revision: { id: string; number: number; message: string; createdAt: string; author: { id: string; name: string } | null; document: unknown } | null;
  approval: CircuitApproval | null;
}

/** A circuit of the given workspace with its newest revision and the approval that still holds; `not_found:circuit` otherwise. */
export async function getCircuit({ workspaceId, circuitId }: { workspaceId: string; circuitId: string }): Promise<CircuitDetail> {
  getSequelize();
  const circuit = (await Circuit.findOne({
    where: { id: circuitId, workspaceId },
    include: [
      { model: CircuitRevision, as: 'currentRevision', include: [{ model: User, as: 'author', attributes: ['id', 'name'] }] },
    ],
  })) as (Circuit & { currentRevision?: CircuitRevision & { author?: User } }) | null;
  if (!circuit) throw new AppError('not_found', 'circuit', 'No such circuit in this workspace');
  const revision = circuit.currentRevision;
  return {
    id: circuit.id,
    title: circuit.title,
    description: circuit.description,
    lockVersion: circuit.lockVersion,
    updatedAt: circuit.updatedAt.toISOString(),
    revision: revision
      ? {
          id: revision.id,
          number: revision.number,
          message: revision.message,
          createdAt: revision.createdAt.toISOString(),
          author: revision.author ? { id: revision.author.id, name: revision.author.name } : null,
          document: revision.document,
        }
      : null,
    approval: await findCircuitApproval({ circuitId }),
  };
}
