import 'server-only';
import { randomUUID } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { isDeepStrictEqual } from 'node:util';
import { DEMO_LOGS } from '@/demo/plant';
import { parseLog } from '@/lib/field-logs';
import { documentOf } from '@/lib/circuits/revision-view';
import { columnsSignature } from '@/lib/replays/mappings';
import { recordedLogFrom } from '@/lib/replays/recorded-log';
import { putObject } from '@/lib/storage/object-store';
import { logObjectKey, sha256Hex } from '@/lib/uploads/uploads';
import { Circuit, CircuitRevision, LogMapping, Upload } from '@/models';

/**
 * Uploads the demo logs to their demo circuits with their saved mappings, as an upload would:
 * the bytes to storage under the upload's key (the storage stand-in runs while the seed does),
 * then the row. Idempotent: a log already there keeps its row, or has it brought up to date when
 * its file or mapping changed; its bytes are put again every time, so a storage wiped since (a
 * fresh test run) holds them too. The mapping is applied to the whole file first, so a broken demo
 * fails here.
 */
export async function seedDemoLogs({ workspaceId, userIdByRole }: { workspaceId: string; userIdByRole: ReadonlyMap<string, string> }): Promise<{ added: number; updated: number }> {
  let added = 0;
  let updated = 0;
  for (const demo of DEMO_LOGS) {
    const uploaderId = userIdByRole.get(demo.uploader);
    if (!uploaderId) throw new Error(`no demo user with role ${demo.uploader}`);
    const circuit = await Circuit.findOne({ where: { workspaceId, title: demo.circuitTitle }, rejectOnEmpty: new Error(`no demo circuit titled ${demo.circuitTitle}`) });
    const revision = await CircuitRevision.findByPk(circuit.currentRevisionId!, { rejectOnEmpty: true });
    const bytes = await readFile(path.join(process.cwd(), 'demo', 'logs', demo.file));
    const parsed = parseLog(bytes, demo.file);
    if (!parsed.ok) throw new Error(`demo/logs/${demo.file}, line ${parsed.errors[0]!.row}: ${parsed.errors[0]!.message}`);
    recordedLogFrom({ table: parsed.table, mapping: demo.mapping, document: documentOf(revision, 'revisionNumber') });

    const sha256 = sha256Hex(bytes);
    const file = { fileName: demo.file, contentType: 'text/csv', sizeBytes: bytes.byteLength, sha256 };
    let upload = await Upload.findOne({ where: { workspaceId, circuitId: circuit.id, fileName: demo.file, uploadedById: uploaderId } });
    if (!upload) {
      const id = randomUUID();
      await putObject({ key: logObjectKey(id), body: bytes, contentType: 'application/octet-stream' });
      upload = await Upload.create({ id, workspaceId, circuitId: circuit.id, uploadedById: uploaderId, ...file, storageKey: logObjectKey(id) });
      added += 1;
    } else {
      await putObject({ key: upload.storageKey, body: bytes, contentType: 'application/octet-stream' });
      if (upload.sha256 !== sha256) {
        await upload.update(file);
        updated += 1;
      }
    }

    const saved = { name: demo.mappingName, mapping: demo.mapping, columnsSignature: columnsSignature(parsed.table.columns), updatedById: uploaderId };
    const mapping = await LogMapping.findOne({ where: { uploadId: upload.id } });
    if (!mapping) await LogMapping.create({ ...saved, circuitId: circuit.id, uploadId: upload.id });
    else if (!isDeepStrictEqual(mapping.mapping, demo.mapping) || mapping.columnsSignature !== saved.columnsSignature) await mapping.update({ ...saved, revision: mapping.revision + 1 });
  }
  return { added, updated };
}
