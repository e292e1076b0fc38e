import 'server-only';
import { createHash } from 'node:crypto';
import { Op, type WhereOptions } from 'sequelize';
import { z } from 'zod';
import type { CircuitDocument } from '@/engine/document/schema';
import { ruleVocabulary } from '@/engine/proof/rules';
import { mappingSchemaFor, type ColumnMapping } from '@/lib/field-logs';
import { recordAudit } from '@/lib/audit';
import type { Actor } from '@/lib/auth/actor';
import { findCircuit } from '@/lib/circuits/revision-view';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { parseWith } from '@/lib/http/parse';
import { personOf, type Person } from '@/lib/person';
import { revisionWithDocument } from '@/lib/proofs/revision-with-document';
import { parsedLogOf, recordedLogFrom } from '@/lib/replays/recorded-log';
import { findLogUpload } from '@/lib/uploads/uploads';
import { LogMapping, User } from '@/models';

export interface SavedMapping {
  id: string;
  circuitId: string;
  uploadId: string | null;
  name: string;
  mapping: ColumnMapping;
  columnsSignature: string;
  /** Saves so far; send it back with the next PUT. */
  revision: number;
  updatedBy: Person;
  updatedAt: string;
}

/** `mapping` is checked by columnMappingSchema against the log's own columns in the service. */
export const putMappingBodySchema = z
  .object({
    name: z.string().trim().min(1, 'give the mapping a name').max(120, 'at most 120 characters'),
    mapping: z.unknown(),
    /** The save count the writer read: 0 for the log's first mapping. */
    revision: z.number().int('not a save count').min(0, 'not a save count'),
  })
  .strict();
export type PutMappingBody = z.infer<typeof putMappingBodySchema>;

/** Identifies a log's columns (names, in order): a saved mapping is offered again for logs with the same signature. */
export function columnsSignature(columns: readonly string[]): string {
  return createHash('sha256').update(JSON.stringify(columns)).digest('hex');
}

type LoadedMapping = LogMapping & { updatedBy: User };

function savedMapping(row: LoadedMapping): SavedMapping {
  return {
    id: row.id,
    circuitId: row.circuitId,
    uploadId: row.uploadId,
    name: row.name,
    mapping: row.mapping as ColumnMapping,
    columnsSignature: row.columnsSignature,
    revision: row.revision,
    updatedBy: personOf(row.updatedBy),
    updatedAt: row.updatedAt.toISOString(),
  };
}

const withUpdatedBy = [{ model: User, as: 'updatedBy', attributes: ['id', 'name'] }];

/** The mapping saved for a log, or null. */
export async function findSavedMapping(uploadId: string): Promise<SavedMapping | null> {
  getSequelize();
  const row = (await LogMapping.findOne({ where: { uploadId }, include: withUpdatedBy })) as LoadedMapping | null;
  return row && savedMapping(row);
}

/** The mapping saved for a log; `invalid:mapping` when there is none yet (a replay needs one). */
export async function savedMappingOf(uploadId: string): Promise<SavedMapping> {
  const saved = await findSavedMapping(uploadId);
  if (!saved) throw new AppError('invalid', 'mapping', 'Map the columns of this log to the circuit first', 'mapping');
  return saved;
}

/**
 * Every mapped column must name a tag of the drawing and a word the rule language knows for it:
 * a state word, `pressure:<port>` of one of its air ports, or `position` of a cylinder.
 */
function checkAgainstDrawing(mapping: ColumnMapping, document: CircuitDocument, revisionNumber: number): void {
  const vocabulary = new Map(ruleVocabulary(document).map((entry) => [entry.tag, entry]));
  mapping.columns.forEach((column, i) => {
    if (column.role === 'ignore') return;
    const entry = vocabulary.get(column.tag);
    if (!entry) {
      const field = `mapping.columns.${i}.tag`;
      throw new AppError('invalid', field, `${field}: revision ${revisionNumber} has no part tagged ${column.tag} that a log can record`, field);
    }
    const port = column.word.startsWith('pressure:') ? column.word.slice('pressure:'.length) : null;
    const known =
      port !== null ? entry.ports.includes(port) : column.word === 'position' ? entry.type.startsWith('cylinder-') : entry.words.includes(column.word);
    if (!known) {
      const field = `mapping.columns.${i}.word`;
      const offered = [...entry.words, ...entry.ports.map((p) => `pressure:${p}`), ...(entry.type.startsWith('cylinder-') ? ['position'] : [])];
      throw new AppError('invalid', field, `${field}: ${column.tag} has no '${column.word}'; it has ${offered.join(', ')}`, field);
    }
  });
}

/**
 * Saves the mapping of a log: checked by the schema against the log's columns, against the
 * circuit's newest revision, and by applying it to every row of the file — any row or column
 * that does not read gives 400 with every problem in `errors`, and nothing is stored. The first
 * save creates the mapping (revision 0 sent); later ones must send the save count they read.
 */
export async function putLogMapping({ actor, uploadId, input }: { actor: Actor; uploadId: string; input: PutMappingBody }): Promise<SavedMapping> {
  const sequelize = getSequelize();
  const upload = await findLogUpload({ workspaceId: actor.workspaceId, uploadId });
  const table = await parsedLogOf(upload);
  const mapping = parseWith(mappingSchemaFor(table.columns), input.mapping, 'mapping') as ColumnMapping;
  const { revision, document } = await revisionWithDocument({ workspaceId: actor.workspaceId, circuitId: upload.circuitId });
  checkAgainstDrawing(mapping, document, revision.number);
  recordedLogFrom({ table, mapping, document });
  const signature = columnsSignature(table.columns);
  const id = await sequelize.transaction(async (transaction) => {
    const existing = await LogMapping.findOne({ where: { uploadId }, transaction, lock: transaction.LOCK.UPDATE });
    if ((existing?.revision ?? 0) !== input.revision) {
      throw new AppError('conflict', 'mapping', `This mapping was saved ${existing ? `${existing.revision} times` : 'never'} and you sent save ${input.revision}; load it again`, 'revision');
    }
    const values = { name: input.name, mapping, columnsSignature: signature, updatedById: actor.userId };
    const saved = existing
      ? await existing.update({ ...values, revision: existing.revision + 1 }, { transaction })
      : await LogMapping.create({ ...values, circuitId: upload.circuitId, uploadId }, { transaction });
    await recordAudit({ action: 'log_mapping.saved', actorId: actor.userId, workspaceId: actor.workspaceId, targetType: 'log_mapping', targetId: saved.id, data: { uploadId, revision: saved.revision } }, transaction);
    return saved.id;
  });
  return savedMapping((await LogMapping.findByPk(id, { include: withUpdatedBy, rejectOnEmpty: true })) as LoadedMapping);
}

/** Saved mappings with who saved them, newest first. */
async function savedMappingsWhere(where: WhereOptions<LogMapping>): Promise<SavedMapping[]> {
  const rows = (await LogMapping.findAll({
    where,
    include: withUpdatedBy,
    order: [
      ['updatedAt', 'DESC'],
      ['id', 'ASC'],
    ],
  })) as LoadedMapping[];
  return rows.map(savedMapping);
}

/** The circuit's mappings saved for other logs with the same columns, newest first: a new log can start from one. */
export async function reusableMappings({ circuitId, uploadId, signature }: { circuitId: string; uploadId: string; signature: string }): Promise<SavedMapping[]> {
  getSequelize();
  return savedMappingsWhere({ circuitId, columnsSignature: signature, uploadId: { [Op.or]: [{ [Op.ne]: uploadId }, { [Op.is]: null }] } });
}

/** A circuit's saved mappings, newest first; pick one whose `columnsSignature` matches a new log's to start from it. */
export async function listLogMappings({ workspaceId, circuitId }: { workspaceId: string; circuitId: string }): Promise<SavedMapping[]> {
  getSequelize();
  await findCircuit({ workspaceId, circuitId });
  return savedMappingsWhere({ circuitId });
}
