import { z } from 'zod';
import type { VocabularyEntry } from '@/engine/proof/rules';
import type { LogTable } from './types';

/** Units a number column may be written in; gauge pressures are read against the drawing's ambient pressure. */
export const LOG_UNITS = ['bar-gauge', 'bar-absolute', 'kPa-gauge', 'Pa-absolute', 'psi-gauge', 'mm', 'm'] as const;
export type LogUnit = (typeof LOG_UNITS)[number];

const PRESSURE_UNITS: ReadonlySet<LogUnit> = new Set(['bar-gauge', 'bar-absolute', 'kPa-gauge', 'Pa-absolute', 'psi-gauge']);
const LENGTH_UNITS: ReadonlySet<LogUnit> = new Set(['mm', 'm']);

/** 'number' for `pressure:<port>` and `position`, 'state' for every state word. */
export function kindOfWord(word: string): 'state' | 'number' {
  return word.startsWith('pressure:') || word === 'position' ? 'number' : 'state';
}

const mappedColumnSchema = z.object({
  column: z.string().min(1),
  tag: z.string(),
  word: z.string(),
  role: z.enum(['command', 'observation', 'ignore']),
  unit: z.enum(LOG_UNITS).optional(),
});

/** How a log's columns become recorded signals: which column is the time, and what each other column records. */
export const columnMappingSchema = z
  .object({
    time: z.object({ column: z.string().min(1), format: z.enum(['seconds', 'milliseconds', 'iso8601']) }),
    columns: z.array(mappedColumnSchema),
  })
  .superRefine((mapping, ctx) => {
    const signals = new Map<string, number>();
    const columns = new Set<string>();
    mapping.columns.forEach((c, i) => {
      if (columns.has(c.column)) ctx.addIssue({ code: 'custom', path: ['columns', i, 'column'], message: `the column '${c.column}' is mapped twice` });
      columns.add(c.column);
      if (c.role === 'ignore') return;
      if (c.column === mapping.time.column) ctx.addIssue({ code: 'custom', path: ['columns', i, 'column'], message: `'${c.column}' is the time column` });
      if (c.tag.trim() === '') ctx.addIssue({ code: 'custom', path: ['columns', i, 'tag'], message: `choose the tag '${c.column}' records` });
      if (c.word.trim() === '') ctx.addIssue({ code: 'custom', path: ['columns', i, 'word'], message: `choose what '${c.column}' records of ${c.tag || 'its tag'}` });
      const kind = kindOfWord(c.word);
      if (kind === 'state' && c.unit) ctx.addIssue({ code: 'custom', path: ['columns', i, 'unit'], message: `'${c.word}' is an on/off state and takes no unit` });
      if (c.word.startsWith('pressure:') && c.unit && !PRESSURE_UNITS.has(c.unit)) ctx.addIssue({ code: 'custom', path: ['columns', i, 'unit'], message: `a pressure takes a pressure unit, not ${c.unit}` });
      if (c.word === 'position' && c.unit && !LENGTH_UNITS.has(c.unit)) ctx.addIssue({ code: 'custom', path: ['columns', i, 'unit'], message: `a position takes mm or m, not ${c.unit}` });
      if (c.role === 'command' && kind === 'number') ctx.addIssue({ code: 'custom', path: ['columns', i, 'role'], message: `a command must be an on/off state; '${c.word}' is a measured value` });
      const key = `${c.tag}\u0000${c.word}`;
      const first = signals.get(key);
      if (first !== undefined) ctx.addIssue({ code: 'custom', path: ['columns', i, 'word'], message: `${c.tag} ${c.word} is already recorded by '${mapping.columns[first]!.column}'` });
      else signals.set(key, i);
    });
  });

export type ColumnMapping = z.infer<typeof columnMappingSchema>;
export type MappedColumn = ColumnMapping['columns'][number];

/** The mapping schema for one table: also every column it names must be in the log. */
export function mappingSchemaFor(columns: readonly string[]) {
  const known = new Set(columns);
  return columnMappingSchema.superRefine((mapping, ctx) => {
    if (!known.has(mapping.time.column)) ctx.addIssue({ code: 'custom', path: ['time', 'column'], message: `the log has no column '${mapping.time.column}'` });
    mapping.columns.forEach((c, i) => {
      if (!known.has(c.column)) ctx.addIssue({ code: 'custom', path: ['columns', i, 'column'], message: `the log has no column '${c.column}'` });
    });
  });
}

const PRESSURE_HINTS = new Set(['p', 'pressure', 'pres', 'druck']);
const POSITION_HINTS = new Set(['x', 'pos', 'position', 'stroke']);
const CYLINDER_TYPES = new Set(['cylinder-double-acting', 'cylinder-single-acting']);

/**
 * A first mapping for a log, from its column names: a column names a tag of the drawing
 * (`1B2`, `1B2_down`, `S1 pressed`, `p_1A1_A`), and what it records follows from the rest of
 * the name or the tag's first state word. Buttons, valves worked by hand and solenoid coils are
 * commands; everything else is observed. Columns that name no tag are ignored, and a second
 * column for the same tag and word too. The person reviews every row before a replay.
 */
export function suggestMapping(table: LogTable, vocabulary: readonly VocabularyEntry[]): ColumnMapping {
  const timeColumn = table.timeColumnGuess ?? table.columns[0] ?? '';
  const taken = new Set<string>();
  const columns = table.columns
    .filter((column) => column !== timeColumn)
    .map((column): MappedColumn => {
      const guess = guessColumn(column, vocabulary);
      if (!guess || taken.has(`${guess.tag}\u0000${guess.word}`)) return { column, tag: '', word: '', role: 'ignore' };
      taken.add(`${guess.tag}\u0000${guess.word}`);
      return { column, ...guess };
    });
  return { time: { column: timeColumn, format: table.timeFormatGuess ?? 'seconds' }, columns };
}

function guessColumn(column: string, vocabulary: readonly VocabularyEntry[]): Omit<MappedColumn, 'column'> | null {
  const tokens = column.toLowerCase().split(/[^a-z0-9.]+/).filter(Boolean);
  const entry = [...vocabulary].sort((a, b) => b.tag.length - a.tag.length).find((e) => tokens.includes(e.tag.toLowerCase()));
  const rest = tokens.filter((t) => t !== entry?.tag.toLowerCase());
  const unit = unitFromTokens(rest);

  if (rest.some((t) => PRESSURE_HINTS.has(t)) || (unit && PRESSURE_UNITS.has(unit))) {
    const cylinders = vocabulary.filter((e) => CYLINDER_TYPES.has(e.type));
    const target = entry ?? (cylinders.length === 1 && (rest.includes('cap') || rest.includes('rod')) ? cylinders[0] : undefined);
    const port = target && portFromTokens(target, rest);
    if (!target || !port) return null;
    return { tag: target.tag, word: `pressure:${port}`, role: 'observation', unit: unit && PRESSURE_UNITS.has(unit) ? unit : 'bar-gauge' };
  }
  if (!entry) return null;
  if (CYLINDER_TYPES.has(entry.type) && rest.some((t) => POSITION_HINTS.has(t))) return { tag: entry.tag, word: 'position', role: 'observation', unit: unit === 'mm' ? 'mm' : 'm' };
  const named = column.toLowerCase();
  // Longest first, so `1M1_de-energised` is not read as `energised`.
  const pressable = entry.words.includes('pressed');
  // A valve worked by hand lists its positions first; what a log records of it is the hand on the button.
  const word = [...entry.words].sort((a, b) => b.length - a.length).find((w) => rest.includes(w) || named.includes(`_${w}`) || named.includes(` ${w}`)) ?? (pressable ? 'pressed' : entry.words[0]);
  if (!word) return null;
  const command = entry.type === 'solenoid-coil' || pressable;
  return { tag: entry.tag, word, role: command ? 'command' : 'observation' };
}

function portFromTokens(entry: VocabularyEntry, tokens: string[]): string | undefined {
  const named = entry.ports.find((port) => tokens.includes(port.toLowerCase()));
  if (named) return named;
  // The cap end is a cylinder's first port (A), the rod end its second (B).
  if (CYLINDER_TYPES.has(entry.type)) {
    if (tokens.includes('cap')) return entry.ports[0];
    if (tokens.includes('rod')) return entry.ports[1];
  }
  return entry.ports.length === 1 ? entry.ports[0] : undefined;
}

function unitFromTokens(tokens: string[]): LogUnit | undefined {
  const absolute = tokens.includes('abs') || tokens.includes('bara');
  if (tokens.includes('bar') || tokens.includes('barg') || tokens.includes('bara')) return absolute ? 'bar-absolute' : 'bar-gauge';
  if (tokens.includes('kpa')) return 'kPa-gauge';
  if (tokens.includes('psi') || tokens.includes('psig')) return 'psi-gauge';
  if (tokens.includes('pa')) return 'Pa-absolute';
  if (tokens.includes('mm')) return 'mm';
  return undefined;
}
