import { parseIsoMs, parseNumberCell } from './cells';
import type { TimeFormat } from './types';

/** Rows looked at to guess: enough to see the sampling step, cheap on a long log. */
const SAMPLE_ROWS = 200;

/** Names loggers give a time column, compared lower case without spaces, `_`, `-`, brackets or units. */
const TIME_NAMES = /^(t|ts|time|times|timestamp|stamp|zeit|zeitstempel|date|datetime|clock|elapsed)(s|ms|sec|secs|seconds|millis|milliseconds)?$/;

export interface TimeGuess {
  column: string | null;
  format: TimeFormat | null;
}

/**
 * Which column holds the time and how it is written: a column named like a time whose cells
 * read as times, else the first column of ISO 8601 date-times, else a first column of numbers
 * that never go down. Only a guess: the person confirms it in the column mapping.
 */
export function guessTime(columns: string[], rows: string[][], decimalComma: boolean): TimeGuess {
  const sample = rows.slice(0, SAMPLE_ROWS);
  const cellsOf = (index: number) => sample.map((row) => row[index] ?? '');
  const named = columns.findIndex((name) => TIME_NAMES.test(name.toLowerCase().replace(/[\s_\-()[\]]/g, '')));
  if (named >= 0) {
    const format = formatOf(columns[named]!, cellsOf(named), decimalComma);
    if (format) return { column: columns[named]!, format };
  }
  const iso = columns.findIndex((_, i) => cellsOf(i).every((cell) => parseIsoMs(cell) !== null));
  if (iso >= 0 && sample.length > 0) return { column: columns[iso]!, format: 'iso8601' };
  if (columns.length > 0 && sample.length > 0) {
    const format = formatOf(columns[0]!, cellsOf(0), decimalComma);
    if (format && format !== 'iso8601' && nonDecreasing(cellsOf(0).map((c) => parseNumberCell(c, decimalComma)!))) return { column: columns[0]!, format };
  }
  return { column: null, format: null };
}

function formatOf(name: string, cells: string[], decimalComma: boolean): TimeFormat | null {
  if (cells.length === 0) return null;
  if (cells.every((cell) => parseIsoMs(cell) !== null)) return 'iso8601';
  const values = cells.map((cell) => parseNumberCell(cell, decimalComma));
  if (values.some((v) => v === null)) return null;
  const unit = name.toLowerCase();
  if (/(^|[^a-z])(ms|msec|millis|milliseconds)([^a-z]|$)/.test(unit)) return 'milliseconds';
  if (/(^|[^a-z])(s|sec|secs|seconds)([^a-z]|$)/.test(unit)) return 'seconds';
  return looksLikeMilliseconds(values as number[]) ? 'milliseconds' : 'seconds';
}

/**
 * Whole numbers are milliseconds when they are large or step by more than one; seconds since
 * 1970 (about 1e9 to 1e11) stay seconds. A log sampled once a second in whole seconds therefore
 * reads as seconds, one sampled every 10 ms in whole milliseconds as milliseconds.
 */
function looksLikeMilliseconds(values: number[]): boolean {
  if (!values.every(Number.isInteger)) return false;
  const largest = Math.max(...values.map(Math.abs));
  if (largest >= 1e9 && largest < 1e11) return false;
  if (largest >= 1000) return true;
  const steps = values.slice(1).map((v, i) => v - values[i]!).filter((d) => d > 0).sort((a, b) => a - b);
  return steps.length > 0 && steps[Math.floor(steps.length / 2)]! >= 2;
}

function nonDecreasing(values: number[]): boolean {
  return values.every((v, i) => i === 0 || v >= values[i - 1]!);
}
