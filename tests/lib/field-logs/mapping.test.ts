import { describe, expect, it } from 'vitest';
import { ruleVocabulary } from '@/engine/proof/rules';
import { columnMappingSchema, mappingSchemaFor, suggestMapping, type ColumnMapping } from '@/lib/field-logs/mapping';
import { parseLog } from '@/lib/field-logs/parse-log';
import type { LogTable } from '@/lib/field-logs/types';
import { demoDocument } from '@/tests/support/demo-circuits';

function vocabularyOf(name: string) {
  return ruleVocabulary(demoDocument(name));
}

function tableWith(columns: string[]): LogTable {
  const result = parseLog(`${columns.join(';')}\n${columns.map(() => '0').join(';')}\n`, 'log.csv');
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  return result.table;
}

const messages = (mapping: unknown, schema = columnMappingSchema) => {
  const result = schema.safeParse(mapping);
  return result.success ? [] : result.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
};

const VALID: ColumnMapping = {
  time: { column: 'time', format: 'iso8601' },
  columns: [
    { column: 'S1_start', tag: 'S1', word: 'pressed', role: 'command' },
    { column: 'p', tag: '1A1', word: 'pressure:A', role: 'observation', unit: 'bar-gauge' },
    { column: 'note', tag: '', word: '', role: 'ignore' },
  ],
};

describe('columnMappingSchema', () => {
  it('accepts a mapping of states, a pressure with its unit and ignored columns', () => {
    expect(messages(VALID)).toEqual([]);
  });

  it('refuses one tag and word recorded by two columns', () => {
    const twice = { ...VALID, columns: [...VALID.columns, { column: 'S1_again', tag: 'S1', word: 'pressed', role: 'observation' }] };
    expect(messages(twice)).toEqual(["columns.3.word: S1 pressed is already recorded by 'S1_start'"]);
  });

  it('refuses a unit on a state, a wrong unit family, a measured command, a missing tag, and the time column mapped', () => {
    const bad = {
      time: { column: 'time', format: 'seconds' },
      columns: [
        { column: 'a', tag: 'S1', word: 'pressed', role: 'command', unit: 'mm' },
        { column: 'b', tag: '1A1', word: 'pressure:A', role: 'observation', unit: 'mm' },
        { column: 'c', tag: '1A1', word: 'position', role: 'command', unit: 'mm' },
        { column: 'd', tag: '', word: 'on', role: 'observation' },
        { column: 'time', tag: 'K1', word: 'on', role: 'observation' },
      ],
    };
    expect(messages(bad)).toEqual([
      "columns.0.unit: 'pressed' is an on/off state and takes no unit",
      'columns.1.unit: a pressure takes a pressure unit, not mm',
      "columns.2.role: a command must be an on/off state; 'position' is a measured value",
      "columns.3.tag: choose the tag 'd' records",
      "columns.4.column: 'time' is the time column",
    ]);
  });

  it('checks against a log that every column it names is there', () => {
    expect(messages(VALID, mappingSchemaFor(['time', 'S1_start', 'p', 'note']))).toEqual([]);
    expect(messages(VALID, mappingSchemaFor(['timestamp', 'S1_start', 'note']))).toEqual(["time.column: the log has no column 'time'", "columns.1.column: the log has no column 'p'"]);
  });
});

describe('suggestMapping', () => {
  const relay = vocabularyOf('lid-press-relay-control');

  it('matches column names to tags, words, ports and units, with buttons and solenoid coils as commands', () => {
    const table = tableWith(['time', '1B2', 'S1 pressed', 'p_1A1_A', 'p_1A1_B_kpa', '1M1_valve', 'K1_operated', '1A1_pos_mm', 'H1', 'oil_temp']);
    expect(suggestMapping(table, relay)).toEqual({
      time: { column: 'time', format: 'seconds' },
      columns: [
        { column: '1B2', tag: '1B2', word: 'on', role: 'observation' },
        { column: 'S1 pressed', tag: 'S1', word: 'pressed', role: 'command' },
        { column: 'p_1A1_A', tag: '1A1', word: 'pressure:A', role: 'observation', unit: 'bar-gauge' },
        { column: 'p_1A1_B_kpa', tag: '1A1', word: 'pressure:B', role: 'observation', unit: 'kPa-gauge' },
        { column: '1M1_valve', tag: '1M1', word: 'on', role: 'command' },
        { column: 'K1_operated', tag: 'K1', word: 'operated', role: 'observation' },
        { column: '1A1_pos_mm', tag: '1A1', word: 'position', role: 'observation', unit: 'mm' },
        { column: 'H1', tag: 'H1', word: 'on', role: 'observation' },
        { column: 'oil_temp', tag: '', word: '', role: 'ignore' },
      ],
    });
  });

  it('reads the word a name spells, the longest first, and ignores a second column for the same signal', () => {
    const table = tableWith(['t', '1M1_de-energised', '1B2_off', '1B2 off']);
    expect(suggestMapping(table, relay).columns).toEqual([
      { column: '1M1_de-energised', tag: '1M1', word: 'de-energised', role: 'command' },
      { column: '1B2_off', tag: '1B2', word: 'off', role: 'observation' },
      { column: '1B2 off', tag: '', word: '', role: 'ignore' },
    ]);
  });

  it('takes a cap or rod pressure of the only cylinder, and a hand-worked valve as a command', () => {
    const twoHand = vocabularyOf('lid-press-two-hand');
    const table = tableWith(['time', 'p_cap_bar', 'p_rod_bar', '1S1']);
    expect(suggestMapping(table, twoHand).columns).toEqual([
      { column: 'p_cap_bar', tag: '1A1', word: 'pressure:A', role: 'observation', unit: 'bar-gauge' },
      { column: 'p_rod_bar', tag: '1A1', word: 'pressure:B', role: 'observation', unit: 'bar-gauge' },
      { column: '1S1', tag: '1S1', word: 'pressed', role: 'command' },
    ]);
  });

  it('gives a mapping the schema accepts for the log it came from', () => {
    const table = tableWith(['time', '1B2', 'S1 pressed', 'p_1A1_A', '1B2 on', 'misc']);
    expect(messages(suggestMapping(table, relay), mappingSchemaFor(table.columns))).toEqual([]);
  });
});
