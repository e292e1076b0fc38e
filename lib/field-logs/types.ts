/**
 * Shapes of a parsed field log. Pure TypeScript: the browser previews an upload with the same
 * code the server checks it with.
 */

export type LogFormat = 'csv' | 'jsonl';
export type CsvSeparator = ',' | ';' | '\t';
export type TimeFormat = 'seconds' | 'milliseconds' | 'iso8601';

/** A log read into cells, before any column is given a meaning. */
export interface LogTable {
  format: LogFormat;
  /** Column names in file order (CSV header, or JSON keys in first-seen order). */
  columns: string[];
  /** Raw cells, one array per data row, as long as `columns` (a missing JSON key is ''). */
  rows: string[][];
  /** The 1-based line in the file where each row starts, so later errors can point at it. */
  rowLines: number[];
  /** CSV only. */
  separator?: CsvSeparator;
  /** Numbers are written `1,25` (CSV with `;` or tab only). */
  decimalComma: boolean;
  timeColumnGuess: string | null;
  timeFormatGuess: TimeFormat | null;
}

export interface LogError {
  /** 1-based line in the file. */
  row: number;
  column: string | null;
  message: string;
}

export interface LogWarning {
  column: string | null;
  message: string;
}

export type ParseLogResult = { ok: true; table: LogTable } | { ok: false; errors: LogError[] };
