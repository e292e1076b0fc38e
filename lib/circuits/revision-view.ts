import 'server-only';
import type { Includeable, Transaction } from 'sequelize';
import { validateDocument } from '@/engine/document/validate';
import type { CircuitDocument } from '@/engine/document/schema';
import { AppError } from '@/lib/errors';
import { personOf, type Person } from '@/lib/person';
import { Circuit, CircuitRevision, User } from '@/models';

/**
 * Includes for a row that belongs to a revision (a run, a proof): the revision with its number,
 * found only through a circuit of the workspace, and who made the row. `required` makes the
 * workspace condition on the nested circuit filter the row; without it the row would be found
 * through an outer join.
 */
export function revisionInWorkspaceIncludes(workspaceId: string): Includeable[] {
  return [
    {
      model: CircuitRevision,
      as: 'revision',
      attributes: ['id', 'number', 'circuitId'],
      required: true,
      include: [{ model: Circuit, as: 'circuit', attributes: [], where: { workspaceId } }],
    },
    { model: User, as: 'createdBy', attributes: ['id', 'name'] },
  ];
}

export interface RevisionSummary {
  id: string;
  number: number;
  message: string;
  createdAt: string;
  author: Person;
}

export interface RevisionDetail extends RevisionSummary {
  document: unknown;
}

export type RevisionWithAuthor = CircuitRevision & { author: User };

export function revisionSummary(revision: RevisionWithAuthor): RevisionSummary {
  return { id: revision.id, number: revision.number, message: revision.message, createdAt: revision.createdAt.toISOString(), author: personOf(revision.author) };
}

export function revisionDetail(revision: RevisionWithAuthor): RevisionDetail {
  return { ...revisionSummary(revision), document: revision.document };
}

/**
 * A revision's drawing read through the schema, so that fields given defaults since it was saved
 * are filled in. One this version cannot read is `invalid` on `field`, naming the first problem.
 */
export function documentOf(revision: CircuitRevision, field: string): CircuitDocument {
  const checked = validateDocument(revision.document);
  if (checked.ok) return checked.document;
  throw new AppError('invalid', field, `Revision ${revision.number} holds a drawing this version of Airproof cannot read: ${checked.messages[0]}`, field);
}

/** The circuit of the workspace, or `not_found:circuit`: another workspace's circuit is never admitted to exist. */
export async function findCircuit({ workspaceId, circuitId, transaction }: { workspaceId: string; circuitId: string; transaction?: Transaction }): Promise<Circuit> {
  const circuit = await Circuit.findOne({ where: { id: circuitId, workspaceId }, transaction });
  if (!circuit) throw new AppError('not_found', 'circuit', 'No such circuit in this workspace');
  return circuit;
}

/** One revision of a circuit by number, with its author; `not_found:revision` otherwise. */
export async function findRevision({ circuitId, number, field, transaction }: { circuitId: string; number: number; field?: string; transaction?: Transaction }): Promise<RevisionWithAuthor> {
  const revision = (await CircuitRevision.findOne({
    where: { circuitId, number },
    include: [{ model: User, as: 'author', attributes: ['id', 'name'] }],
    transaction,
  })) as RevisionWithAuthor | null;
  if (!revision) throw new AppError('not_found', 'revision', `This circuit has no revision ${number}`, field);
  return revision;
}
