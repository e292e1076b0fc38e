import { looksLikeCommaNumber, looksLikePointNumber, parseIsoMs, parseNumberCell, parseStateCell } from './cells';
import { ErrorList } from './errors';
import { guessTime } from './guess-time';
import type { CsvSeparator, ParseLogResult } from './types';

interface CsvRecord {
  cells: string[];
  /** 1-based line where the record starts. */
  line: number;
}

const SEPARATORS: readonly CsvSeparator[] = [',', ';', '\t'];
/** Lines looked at to choose the separator. */
const SNIFF_LINES = 20;
/** Only the start of a long file is split into lines for that. */
const SNIFF_CHARS = 64 * 1024;

/**
 * Reads CSV text (RFC 4180 quoting, a header row required) into a table. The separator is the
 * one of `,` `;` tab that splits the header into the most columns and the lines after it
 * consistently; decimal commas are assumed in a `;` or tab file whose numbers are written `1,25`.
 */
export function parseCsv(text: string): ParseLogResult {
  const separator = detectSeparator(text);
  const read = readRecords(text, separator);
  if ('error' in read) return { ok: false, errors: [read.error] };
  const records = read.records;
  while (records.length > 0 && isBlank(records[records.length - 1]!)) records.pop();
  if (records.length === 0) return { ok: false, errors: [{ row: 1, column: null, message: 'The file is empty.' }] };

  const errors = new ErrorList();
  const header = records[0]!;
  const names = header.cells.map((cell) => cell.trim());
  if (names.every(looksLikeValue)) {
    return { ok: false, errors: [{ row: header.line, column: null, message: 'The first line holds values, not column names: the log needs a header row naming each column.' }] };
  }
  // A trailing separator on every line (some loggers write one) is no column.
  const trailing = names.length > 1 && names[names.length - 1] === '';
  if (trailing) names.pop();
  names.forEach((name, i) => {
    if (name === '') errors.add(header.line, null, `Column ${i + 1} of the header has no name.`);
    else if (names.indexOf(name) !== i) errors.add(header.line, name, `The column name '${name}' appears twice in the header.`);
  });

  const rows: string[][] = [];
  const rowLines: number[] = [];
  for (const record of records.slice(1)) {
    const cells = trailing && record.cells.length === names.length + 1 && record.cells[names.length] === '' ? record.cells.slice(0, -1) : record.cells;
    if (isBlank(record)) errors.add(record.line, null, 'Blank line inside the data.');
    else if (cells.length !== names.length) errors.add(record.line, null, `Expected ${names.length} cells as in the header, found ${cells.length}.`);
    else {
      rows.push(cells);
      rowLines.push(record.line);
    }
  }
  if (records.length === 1) errors.add(header.line, null, 'The log has a header but no data rows.');
  if (!errors.empty) return { ok: false, errors: errors.list() };

  const decimalComma = separator !== ',' && usesDecimalComma(rows);
  const time = guessTime(names, rows, decimalComma);
  return {
    ok: true,
    table: { format: 'csv', columns: names, rows, rowLines, separator, decimalComma, timeColumnGuess: time.column, timeFormatGuess: time.format },
  };
}

function isBlank(record: CsvRecord): boolean {
  return record.cells.length === 1 && record.cells[0]!.trim() === '';
}

function looksLikeValue(cell: string): boolean {
  return parseNumberCell(cell, false) !== null || parseNumberCell(cell, true) !== null || parseStateCell(cell) !== null || parseIsoMs(cell) !== null;
}

function usesDecimalComma(rows: string[][]): boolean {
  let comma = 0;
  let point = 0;
  for (const row of rows.slice(0, 200)) {
    for (const cell of row) {
      if (looksLikeCommaNumber(cell)) comma += 1;
      else if (looksLikePointNumber(cell)) point += 1;
    }
  }
  return comma > point;
}

function detectSeparator(text: string): CsvSeparator {
  const lines = text.slice(0, SNIFF_CHARS).split(/\r?\n/).filter((line) => line.trim() !== '').slice(0, SNIFF_LINES);
  let best: { separator: CsvSeparator; consistent: number; width: number } = { separator: ',', consistent: -1, width: 1 };
  for (const separator of SEPARATORS) {
    const widths = lines.map((line) => countFields(line, separator));
    const width = widths[0] ?? 1;
    if (width < 2) continue;
    const consistent = widths.filter((w) => w === width).length;
    if (consistent > best.consistent || (consistent === best.consistent && width > best.width)) best = { separator, consistent, width };
  }
  return best.separator;
}

function countFields(line: string, separator: string): number {
  let count = 1;
  let quoted = false;
  for (const ch of line) {
    if (ch === '"') quoted = !quoted;
    else if (ch === separator && !quoted) count += 1;
  }
  return count;
}

/**
 * Splits text into records; a quoted field may hold separators, doubled quotes and line breaks.
 * A line without quotes is split directly, which is most lines of a logger export.
 */
function readRecords(text: string, separator: string): { records: CsvRecord[] } | { error: { row: number; column: null; message: string } } {
  const records: CsvRecord[] = [];
  const lines = text.split(/\r\n|\n|\r/);
  if (lines[lines.length - 1] === '') lines.pop();
  let i = 0;
  while (i < lines.length) {
    const line = lines[i]!;
    if (!line.includes('"')) {
      records.push({ cells: line.split(separator), line: i + 1 });
      i += 1;
      continue;
    }
    const quoted = readQuotedRecord(lines, i, separator);
    if (!quoted) return { error: { row: i + 1, column: null, message: 'A quoted cell starting on this line is never closed.' } };
    records.push({ cells: quoted.cells, line: i + 1 });
    i = quoted.next;
  }
  return { records };
}

/** Reads the record starting at `lines[start]` character by character (RFC 4180); null when a quote is never closed. */
function readQuotedRecord(lines: string[], start: number, separator: string): { cells: string[]; next: number } | null {
  const cells: string[] = [];
  let cell = '';
  let quoted = false;
  for (let at = start; at < lines.length; at += 1) {
    const line = lines[at]!;
    for (let i = 0; i < line.length; i += 1) {
      const ch = line[i]!;
      if (quoted) {
        if (ch === '"' && line[i + 1] === '"') {
          cell += '"';
          i += 1;
        } else if (ch === '"') quoted = false;
        else cell += ch;
      } else if (ch === '"' && cell.trim() === '') {
        quoted = true;
        cell = '';
      } else if (ch === separator) {
        cells.push(cell);
        cell = '';
      } else cell += ch;
    }
    if (!quoted) {
      cells.push(cell);
      return { cells, next: at + 1 };
    }
    cell += '\n';
  }
  return null;
}
