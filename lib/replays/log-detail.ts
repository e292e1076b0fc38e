import 'server-only';
import { ruleVocabulary } from '@/engine/proof/rules';
import { suggestMapping, type ColumnMapping, type LogError, type LogFormat, type LogTable, type TimeFormat } from '@/lib/field-logs';
import { AppError } from '@/lib/errors';
import { revisionWithDocument } from '@/lib/proofs/revision-with-document';
import { columnsSignature, findSavedMapping, reusableMappings, type SavedMapping } from '@/lib/replays/mappings';
import { parsedLogOf, recordedLogFrom } from '@/lib/replays/recorded-log';
import { findLogUpload, uploadSummary, type UploadSummary } from '@/lib/uploads/uploads';

/** Rows of a log shown before it is mapped. */
const PREVIEW_ROWS = 20;

export interface LogPreview {
  format: LogFormat;
  columns: string[];
  /** The first PREVIEW_ROWS rows, raw cells. */
  rows: string[][];
  rowCount: number;
  separator: string | null;
  decimalComma: boolean;
  timeColumnGuess: string | null;
  timeFormatGuess: TimeFormat | null;
  /** A first mapping from the column names and the newest revision's tags, for the person to review. */
  suggestedMapping: ColumnMapping;
}

export interface UploadDetail extends UploadSummary {
  preview: LogPreview | null;
  parseErrors: LogError[] | null;
  columnsSignature: string | null;
  mapping: SavedMapping | null;
  /** Mappings saved for the circuit's other logs with the same columns, newest first: a start for this one. */
  reusableMappings: SavedMapping[];
  /** Seconds the log covers through its saved mapping; null without one, or when it no longer applies. */
  durationS: number | null;
}

function previewOf(table: LogTable, suggestedMapping: ColumnMapping): LogPreview {
  return {
    format: table.format,
    columns: table.columns,
    rows: table.rows.slice(0, PREVIEW_ROWS),
    rowCount: table.rows.length,
    separator: table.separator ?? null,
    decimalComma: table.decimalComma,
    timeColumnGuess: table.timeColumnGuess,
    timeFormatGuess: table.timeFormatGuess,
    suggestedMapping,
  };
}

/** A log with what the mapping page needs: the parsed preview (or why it does not parse) and the saved mapping. */
export async function getLogDetail({ workspaceId, uploadId }: { workspaceId: string; uploadId: string }): Promise<UploadDetail> {
  const upload = await findLogUpload({ workspaceId, uploadId });
  const mapping = await findSavedMapping(upload.id);
  let table: LogTable;
  try {
    table = await parsedLogOf(upload);
  } catch (error) {
    if (!(error instanceof AppError && error.code === 'invalid:log')) throw error;
    return { ...uploadSummary(upload), preview: null, parseErrors: error.errors as LogError[], columnsSignature: null, mapping, reusableMappings: [], durationS: null };
  }
  const { document } = await revisionWithDocument({ workspaceId, circuitId: upload.circuitId });
  let durationS: number | null = null;
  if (mapping) {
    try {
      durationS = recordedLogFrom({ table, mapping: mapping.mapping, document }).log.durationS;
    } catch (error) {
      if (!(error instanceof AppError && error.type === 'invalid')) throw error;
    }
  }
  const signature = columnsSignature(table.columns);
  return {
    ...uploadSummary(upload),
    preview: previewOf(table, suggestMapping(table, ruleVocabulary(document))),
    parseErrors: null,
    columnsSignature: signature,
    mapping,
    reusableMappings: await reusableMappings({ circuitId: upload.circuitId, uploadId: upload.id, signature }),
    durationS,
  };
}
