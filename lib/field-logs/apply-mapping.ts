import type { RecordedLog, RecordedSignal } from '@/engine/replay/types';
import { parseNumberCell, parseStateCell, parseTimeCell, secondsBetween } from './cells';
import { ErrorList } from './errors';
import { kindOfWord, mappingSchemaFor, type ColumnMapping, type LogUnit } from './mapping';
import type { LogError, LogTable, LogWarning } from './types';

/** psi in Pa: 1 lbf/in² = 0.453 592 37 kg × 9.806 65 m/s² / (0.0254 m)² (exact, from the international pound and inch of 1959). */
export const PA_PER_PSI = (0.45359237 * 9.80665) / 0.0254 ** 2;

export type ApplyMappingResult = { ok: true; log: RecordedLog; warnings: LogWarning[] } | { ok: false; errors: LogError[] };

/**
 * Turns a table into a recorded log with the person's mapping: times from the first row, state
 * columns as 0/1 edges (a repeat of the same value is dropped), number columns in SI (gauge
 * pressures made absolute with `ambientPa`). All or nothing: any unreadable cell, time going
 * backwards or mapping problem gives errors and no log. An empty cell is no reading in that row.
 */
export function applyMapping(table: LogTable, mapping: ColumnMapping, { ambientPa }: { ambientPa: number }): ApplyMappingResult {
  const checked = mappingSchemaFor(table.columns).safeParse(mapping);
  if (!checked.success) {
    return { ok: false, errors: checked.error.issues.map((issue) => ({ row: 1, column: columnOfIssue(mapping, issue.path), message: issue.message })) };
  }
  const errors = new ErrorList();
  const line = (r: number) => table.rowLines[r] ?? r + 2;

  const timeIndex = table.columns.indexOf(mapping.time.column);
  const times: number[] = [];
  let first: number | null = null;
  table.rows.forEach((row, r) => {
    const raw = parseTimeCell(row[timeIndex] ?? '', mapping.time.format, table.decimalComma);
    if (raw === null) {
      errors.add(line(r), mapping.time.column, `'${row[timeIndex] ?? ''}' is not a time in ${TIME_FORMAT_WORDS[mapping.time.format]}.`);
      times.push(Number.NaN);
      return;
    }
    first ??= raw;
    const t = secondsBetween(first, raw, mapping.time.format);
    const before = times.findLast((x) => !Number.isNaN(x));
    if (before !== undefined && t < before) errors.add(line(r), mapping.time.column, `Time goes backwards: ${formatS(t)} s after ${formatS(before)} s on the row before.`);
    times.push(t);
  });

  const signals: RecordedSignal[] = [];
  const warnings: LogWarning[] = [];
  for (const c of mapping.columns) {
    if (c.role === 'ignore') continue;
    const index = table.columns.indexOf(c.column);
    const kind = kindOfWord(c.word);
    const signal: RecordedSignal = { tag: c.tag, word: c.word, role: c.role, kind, times: [], values: [] };
    table.rows.forEach((row, r) => {
      const cell = row[index] ?? '';
      if (cell.trim() === '') return;
      const value = kind === 'state' ? parseStateCell(cell) : toSi(parseNumberCell(cell, table.decimalComma), c.unit, ambientPa);
      if (value === null) {
        const expected = kind === 'state' ? 'a state (0/1, true/false, on/off, high/low)' : `a number${table.decimalComma ? ' with a decimal comma' : ''}`;
        errors.add(line(r), c.column, `'${cell}' is not ${expected}.`);
        return;
      }
      if (c.word.startsWith('pressure:') && value < 0) {
        errors.add(line(r), c.column, `'${cell}' is below vacuum with the unit ${c.unit ?? 'Pa-absolute'}: is the unit right?`);
        return;
      }
      if (kind === 'state' && signal.values.length > 0 && signal.values[signal.values.length - 1] === value) return;
      signal.times.push(times[r]!);
      signal.values.push(value);
    });
    if (signal.times.length === 0) errors.add(line(0), c.column, `The column '${c.column}' has no values.`);
    else if (kind === 'state' && signal.values.length === 1) warnings.push({ column: c.column, message: `${c.tag} ${c.word} never changes in this log.` });
    signals.push(signal);
  }
  if (!errors.empty) return { ok: false, errors: errors.list() };
  if (!signals.some((s) => s.role === 'command')) warnings.push({ column: null, message: 'No column is a command: the replay will run the circuit without inputs.' });
  return { ok: true, log: { signals, durationS: times[times.length - 1] ?? 0 }, warnings };
}

const TIME_FORMAT_WORDS = { seconds: 'seconds', milliseconds: 'milliseconds', iso8601: 'ISO 8601 (2026-11-28T14:03:12.250Z)' } as const;

/** A reading in SI: Pa absolute for pressures, m for positions. */
function toSi(value: number | null, unit: LogUnit | undefined, ambientPa: number): number | null {
  if (value === null) return null;
  switch (unit) {
    case 'bar-gauge':
      return value * 1e5 + ambientPa;
    case 'bar-absolute':
      return value * 1e5;
    case 'kPa-gauge':
      return value * 1e3 + ambientPa;
    case 'psi-gauge':
      return value * PA_PER_PSI + ambientPa;
    case 'mm':
      return value / 1000;
    case 'Pa-absolute':
    case 'm':
    case undefined:
      return value;
  }
}

function columnOfIssue(mapping: ColumnMapping, path: ReadonlyArray<PropertyKey>): string | null {
  if (path[0] === 'time') return mapping.time?.column ?? null;
  if (path[0] === 'columns' && typeof path[1] === 'number') return mapping.columns?.[path[1]]?.column ?? null;
  return null;
}

function formatS(t: number): string {
  return Number(t.toFixed(6)).toString();
}
