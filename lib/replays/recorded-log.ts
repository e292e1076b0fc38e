import 'server-only';
import type { CircuitDocument } from '@/engine/document/schema';
import type { RecordedLog } from '@/engine/replay/types';
import { applyMapping, parseLog, type ColumnMapping, type LogTable, type LogWarning } from '@/lib/field-logs';
import { AppError } from '@/lib/errors';
import { readLogBytes } from '@/lib/uploads/uploads';
import type { Upload } from '@/models';

/** A stored log read into its table; a file that does not parse is `invalid:log` with every problem in `errors`. */
export async function parsedLogOf(upload: Upload): Promise<LogTable> {
  const parsed = parseLog(await readLogBytes(upload), upload.fileName);
  if (parsed.ok) return parsed.table;
  const first = parsed.errors[0]!;
  throw new AppError('invalid', 'log', `${upload.fileName}, line ${first.row}: ${first.message}`, 'log', parsed.errors);
}

/**
 * The recorded log a mapping makes of a table, pressures made absolute with the drawing's ambient.
 * All or nothing: any row or column that does not read is `invalid:mapping` with every problem in
 * `errors` (row, column name, message).
 */
export function recordedLogFrom({ table, mapping, document }: { table: LogTable; mapping: ColumnMapping; document: CircuitDocument }): { log: RecordedLog; warnings: LogWarning[] } {
  const applied = applyMapping(table, mapping, { ambientPa: document.settings.ambientPressurePa });
  if (applied.ok) return { log: applied.log, warnings: applied.warnings };
  const first = applied.errors[0]!;
  const where = [`line ${first.row}`, first.column && `column '${first.column}'`].filter(Boolean).join(', ');
  throw new AppError('invalid', 'mapping', `${where}: ${first.message}${applied.errors.length > 1 ? ` (and ${applied.errors.length - 1} more)` : ''}`, 'mapping', applied.errors);
}

/** A stored log read through a mapping, for a replay or a fault search on `document`. */
export async function recordedLogOf({ upload, mapping, document }: { upload: Upload; mapping: ColumnMapping; document: CircuitDocument }): Promise<RecordedLog> {
  return recordedLogFrom({ table: await parsedLogOf(upload), mapping, document }).log;
}
