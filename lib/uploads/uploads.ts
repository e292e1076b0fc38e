import 'server-only';
import { createHash, randomUUID } from 'node:crypto';
import { LOG_EXTENSIONS, logFormatFromName, MAX_LOG_BYTES, sniffLogType } from '@/lib/field-logs';
import { recordAudit } from '@/lib/audit';
import type { Actor } from '@/lib/auth/actor';
import { findCircuit } from '@/lib/circuits/revision-view';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { personOf, type Person } from '@/lib/person';
import { deleteObject, getObject, putObject } from '@/lib/storage/object-store';
import { readLimitedBody } from '@/lib/uploads/read-body';
import type { ListLogsQuery } from '@/lib/uploads/schemas';
import { Circuit, Upload, User } from '@/models';

/** Where a log's bytes are kept in object storage. */
export function logObjectKey(uploadId: string): string {
  return `logs/${uploadId}`;
}

export function sha256Hex(bytes: Uint8Array): string {
  return createHash('sha256').update(bytes).digest('hex');
}

/** Media types a log may be sent as; the bytes are checked whatever the header says. */
const ACCEPTED_CONTENT_TYPES = ['application/octet-stream', 'text/csv', 'text/plain', 'application/x-ndjson', 'application/jsonl'];

export interface UploadSummary {
  id: string;
  circuitId: string;
  fileName: string;
  contentType: string;
  sizeBytes: number;
  sha256: string;
  uploadedBy: Person;
  createdAt: string;
}

export interface UploadPage {
  items: UploadSummary[];
  page: number;
  pageSize: number;
  total: number;
}

export type LoadedUpload = Upload & { uploadedBy: User; circuitId: string };

export function uploadSummary(upload: LoadedUpload): UploadSummary {
  return {
    id: upload.id,
    circuitId: upload.circuitId,
    fileName: upload.fileName,
    contentType: upload.contentType,
    sizeBytes: Number(upload.sizeBytes),
    sha256: upload.sha256,
    uploadedBy: personOf(upload.uploadedBy),
    createdAt: upload.createdAt.toISOString(),
  };
}

/** A field log of a circuit of the workspace; `not_found:log` otherwise (another workspace's is never admitted to exist). */
export async function findLogUpload({ workspaceId, uploadId }: { workspaceId: string; uploadId: string }): Promise<LoadedUpload> {
  getSequelize();
  const upload = (await Upload.findOne({
    where: { id: uploadId, workspaceId },
    include: [
      { model: User, as: 'uploadedBy', attributes: ['id', 'name'] },
      { model: Circuit, as: 'circuit', attributes: ['id'], required: true },
    ],
  })) as LoadedUpload | null;
  if (!upload) throw new AppError('not_found', 'log', 'No such log in this workspace');
  return upload;
}

function checkContentType(header: string | null): string {
  const type = (header ?? 'application/octet-stream').split(';')[0]!.trim().toLowerCase();
  if (!ACCEPTED_CONTENT_TYPES.includes(type)) {
    throw new AppError('invalid', 'content_type', `Send the log's bytes as application/octet-stream or text/csv, not ${type}`, 'content-type');
  }
  return type;
}

/**
 * Keeps a field log of a circuit: the bytes read up to MAX_LOG_BYTES (413 beyond), checked by
 * name and content (text, UTF-8, a format the parser reads; never run or rendered), hashed here,
 * put in storage under `logs/<id>` as opaque bytes, then the row. Storage first, outside any
 * transaction, as for saved runs: storage refusing leaves no row.
 */
export async function createLogUpload({ actor, circuitId, fileName, request }: { actor: Actor; circuitId: string; fileName: string; request: Request }): Promise<UploadSummary> {
  getSequelize();
  await findCircuit({ workspaceId: actor.workspaceId, circuitId });
  const contentType = checkContentType(request.headers.get('content-type'));
  const promised = logFormatFromName(fileName);
  if (!promised) {
    throw new AppError('invalid', 'file', `${fileName}: a field log must end in ${LOG_EXTENSIONS.join(', ')}`, 'fileName');
  }
  const bytes = await readLimitedBody(request, MAX_LOG_BYTES);
  if (!bytes.byteLength) throw new AppError('invalid', 'file', `${fileName} is empty`, 'body');
  const sniffed = sniffLogType(bytes);
  if (!sniffed.ok) throw new AppError('invalid', 'file', `${fileName}, line ${sniffed.error.row}: ${sniffed.error.message}`, 'body', [sniffed.error]);
  if (promised !== 'by-content' && promised !== sniffed.format) {
    throw new AppError('invalid', 'file', `${fileName} is named as ${promised === 'csv' ? 'CSV' : 'JSON lines'} but holds ${sniffed.format === 'csv' ? 'CSV' : 'JSON lines'}; rename it`, 'fileName');
  }
  const id = randomUUID();
  const storageKey = logObjectKey(id);
  const sha256 = sha256Hex(bytes);
  await putObject({ key: storageKey, body: bytes, contentType: 'application/octet-stream' });
  await Upload.create({ id, workspaceId: actor.workspaceId, circuitId, uploadedById: actor.userId, fileName, contentType, sizeBytes: bytes.byteLength, sha256, storageKey });
  await recordAudit({ action: 'log.uploaded', actorId: actor.userId, workspaceId: actor.workspaceId, targetType: 'upload', targetId: id, data: { circuitId, fileName, sizeBytes: bytes.byteLength, sha256 } });
  return uploadSummary(await findLogUpload({ workspaceId: actor.workspaceId, uploadId: id }));
}

/** One page of a circuit's logs, newest first. */
export async function listLogUploads({ workspaceId, circuitId, query }: { workspaceId: string; circuitId: string; query: ListLogsQuery }): Promise<UploadPage> {
  getSequelize();
  await findCircuit({ workspaceId, circuitId });
  const { rows, count } = await Upload.findAndCountAll({
    where: { workspaceId, circuitId },
    include: [{ model: User, as: 'uploadedBy', attributes: ['id', 'name'] }],
    order: [
      ['createdAt', 'DESC'],
      ['id', 'ASC'],
    ],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  return { items: (rows as LoadedUpload[]).map(uploadSummary), page: query.page, pageSize: query.pageSize, total: count };
}

/** The stored bytes of a log. */
export async function readLogBytes(upload: Upload): Promise<Uint8Array> {
  return new Uint8Array(await new Response(await getObject(upload.storageKey)).arrayBuffer());
}

/** Deletes a log (its replays and fault searches go with it; mappings saved from it stay for the circuit). Its uploader or an owner. */
export async function deleteLogUpload({ actor, uploadId }: { actor: Actor; uploadId: string }): Promise<void> {
  const sequelize = getSequelize();
  const upload = await findLogUpload({ workspaceId: actor.workspaceId, uploadId });
  if (upload.uploadedById !== actor.userId && actor.role !== 'owner') {
    throw new AppError('forbidden', 'log', 'Only whoever uploaded this log, or an owner, may delete it');
  }
  await sequelize.transaction(async (transaction) => {
    await Upload.destroy({ where: { id: upload.id }, transaction });
    await recordAudit({ action: 'log.deleted', actorId: actor.userId, workspaceId: actor.workspaceId, targetType: 'upload', targetId: upload.id, data: { fileName: upload.fileName, sha256: upload.sha256 } }, transaction);
  });
  // After the row: a failed delete leaves bytes nothing points at, which costs only space.
  await deleteObject(upload.storageKey).catch((error: unknown) => console.error('[airproof] could not delete a log object', upload.storageKey, error));
}
