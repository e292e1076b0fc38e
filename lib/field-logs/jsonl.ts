import { ErrorList } from './errors';
import { guessTime } from './guess-time';
import type { ParseLogResult } from './types';

/**
 * Reads JSON lines: one object per line, its keys the columns (the union over all lines, in the
 * order first seen). Blank lines are skipped; a key a line lacks is an empty cell there.
 */
export function parseJsonLines(text: string): ParseLogResult {
  const errors = new ErrorList();
  const columns: string[] = [];
  const index = new Map<string, number>();
  const objects: Array<{ line: number; value: Record<string, unknown> }> = [];
  text.split(/\r?\n/).forEach((raw, i) => {
    const line = i + 1;
    if (raw.trim() === '') return;
    let value: unknown;
    try {
      value = JSON.parse(raw);
    } catch {
      errors.add(line, null, 'This line is not valid JSON.');
      return;
    }
    if (value === null || typeof value !== 'object' || Array.isArray(value)) {
      errors.add(line, null, 'Each line must be one JSON object ({"time": …, "S1": …}).');
      return;
    }
    for (const key of Object.keys(value)) {
      if (!index.has(key)) {
        index.set(key, columns.length);
        columns.push(key);
      }
    }
    objects.push({ line, value: value as Record<string, unknown> });
  });
  if (objects.length === 0 && errors.empty) return { ok: false, errors: [{ row: 1, column: null, message: 'The file is empty.' }] };
  if (!errors.empty) return { ok: false, errors: errors.list() };

  const rows = objects.map(({ value }) => columns.map((key) => cellOf(value[key])));
  const time = guessTime(columns, rows, false);
  return {
    ok: true,
    table: { format: 'jsonl', columns, rows, rowLines: objects.map((o) => o.line), decimalComma: false, timeColumnGuess: time.column, timeFormatGuess: time.format },
  };
}

function cellOf(value: unknown): string {
  if (value === undefined || value === null) return '';
  if (typeof value === 'string') return value;
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  return JSON.stringify(value);
}
