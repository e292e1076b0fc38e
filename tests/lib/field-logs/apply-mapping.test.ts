import { describe, expect, it } from 'vitest';
import { applyMapping, PA_PER_PSI } from '@/lib/field-logs/apply-mapping';
import type { ColumnMapping } from '@/lib/field-logs/mapping';
import { parseLog } from '@/lib/field-logs/parse-log';
import type { LogTable } from '@/lib/field-logs/types';

/** Standard atmosphere, Pa (exact, 10th CGPM 1954): the drawings' default ambient pressure. */
const AMBIENT_PA = 101_325;

function table(text: string, fileName = 'log.csv'): LogTable {
  const result = parseLog(text, fileName);
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  return result.table;
}

const LOG = ['time;S1;1B2;p_bar', '10,00;0;0;0,0', '10,01;1;0;0,0', '10,02;1;0;2,5', '10,03;1;1;6,0', '10,04;0;1;6,0', '10,05;0;0;0,5'].join('\n');

const MAPPING: ColumnMapping = {
  time: { column: 'time', format: 'seconds' },
  columns: [
    { column: 'S1', tag: 'S1', word: 'pressed', role: 'command' },
    { column: '1B2', tag: '1B2', word: 'on', role: 'observation' },
    { column: 'p_bar', tag: '1A1', word: 'pressure:A', role: 'observation', unit: 'bar-gauge' },
  ],
};

describe('applyMapping', () => {
  it('makes times relative to the first row, keeps state edges only, and converts bar gauge to Pa absolute', () => {
    const result = applyMapping(table(LOG), MAPPING, { ambientPa: AMBIENT_PA });
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    const [s1, b2, p] = result.log.signals;
    expect(result.log.durationS).toBeCloseTo(0.05, 12);
    expect(s1).toMatchObject({ tag: 'S1', word: 'pressed', role: 'command', kind: 'state', values: [0, 1, 0] });
    expect(s1!.times).toEqual([0, expect.closeTo(0.01, 12), expect.closeTo(0.04, 12)]);
    expect(b2).toMatchObject({ tag: '1B2', word: 'on', role: 'observation', kind: 'state', values: [0, 1, 0] });
    expect(b2!.times).toEqual([0, expect.closeTo(0.03, 12), expect.closeTo(0.05, 12)]);
    expect(p).toMatchObject({ tag: '1A1', word: 'pressure:A', kind: 'number' });
    expect(p!.times).toHaveLength(6);
    // 6 bar gauge at the standard atmosphere is 701 325 Pa absolute.
    expect(p!.values).toEqual([101_325, 101_325, 351_325, 701_325, 701_325, 151_325]);
    expect(result.warnings).toEqual([]);
  });

  it('uses the ambient pressure it is given for gauge units', () => {
    const result = applyMapping(table(LOG), MAPPING, { ambientPa: 95_000 });
    expect(result.ok && result.log.signals[2]!.values[3]).toBe(695_000);
  });

  it.each([
    ['bar-absolute', '6,5', 650_000],
    ['kPa-gauge', '600', 701_325],
    ['Pa-absolute', '701325', 701_325],
    ['psi-gauge', '100', 100 * PA_PER_PSI + AMBIENT_PA],
    ['mm', '12,5', 0.0125],
    ['m', '0,1', 0.1],
  ] as const)('converts %s to SI', (unit, cell, si) => {
    const word = unit === 'mm' || unit === 'm' ? 'position' : 'pressure:A';
    const result = applyMapping(table(`t;v\n0;${cell}\n`), { time: { column: 't', format: 'seconds' }, columns: [{ column: 'v', tag: '1A1', word, role: 'observation', unit }] }, { ambientPa: AMBIENT_PA });
    expect(result.ok && result.log.signals[0]!.values[0]).toBeCloseTo(si, 9);
  });

  it('takes psi as 6 894.757 Pa', () => {
    // 1 psi = 6.894 757 kPa (NIST SP 811, 2008, appendix B.8).
    expect(PA_PER_PSI).toBeCloseTo(6894.757, 3);
  });

  it('reads milliseconds and ISO 8601 times with changing offsets relative to the first row', () => {
    const ms = applyMapping(table('t_ms,S1\n5000,0\n5250,1\n'), { time: { column: 't_ms', format: 'milliseconds' }, columns: [{ column: 'S1', tag: 'S1', word: 'pressed', role: 'command' }] }, { ambientPa: AMBIENT_PA });
    expect(ms.ok && ms.log.signals[0]!.times).toEqual([0, 0.25]);
    const iso = table('{"at":"2026-11-28T14:03:12.250Z","S1":false}\n{"at":"2026-11-28T15:03:12.500+01:00","S1":true}\n', 'log.jsonl');
    const result = applyMapping(iso, { time: { column: 'at', format: 'iso8601' }, columns: [{ column: 'S1', tag: 'S1', word: 'pressed', role: 'command' }] }, { ambientPa: AMBIENT_PA });
    expect(result.ok && result.log.signals[0]!.times).toEqual([0, 0.25]);
    expect(result.ok && result.log.durationS).toBe(0.25);
  });

  it('reads an empty cell as no reading in that row', () => {
    const events = table('{"t":0,"S1":0,"1B2":0}\n{"t":0.2,"S1":1}\n{"t":0.9,"1B2":"high"}\n', 'log.jsonl');
    const result = applyMapping(events, { time: { column: 't', format: 'seconds' }, columns: [{ column: '1B2', tag: '1B2', word: 'on', role: 'observation' }, { column: 'S1', tag: 'S1', word: 'pressed', role: 'command' }] }, { ambientPa: AMBIENT_PA });
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    expect(result.log.signals.map((s) => [s.times, s.values])).toEqual([
      [[0, 0.9], [0, 1]],
      [[0, 0.2], [0, 1]],
    ]);
  });

  it('warns of a state that never changes and of a log without commands', () => {
    const result = applyMapping(table('t,1B2\n0,0\n1,0\n'), { time: { column: 't', format: 'seconds' }, columns: [{ column: '1B2', tag: '1B2', word: 'on', role: 'observation' }] }, { ambientPa: AMBIENT_PA });
    expect(result.ok && result.warnings.map((w) => w.column)).toEqual(['1B2', null]);
  });

  it('names the row and column of an unreadable number and state, and gives no log at all', () => {
    const broken = LOG.replace('10,02;1;0;2,5', '10,02;maybe;0;2.5');
    const result = applyMapping(table(broken), MAPPING, { ambientPa: AMBIENT_PA });
    expect(result).toEqual({
      ok: false,
      errors: [
        { row: 4, column: 'S1', message: "'maybe' is not a state (0/1, true/false, on/off, high/low)." },
        { row: 4, column: 'p_bar', message: "'2.5' is not a number with a decimal comma." },
      ],
    });
  });

  it('does not read columns the mapping ignores', () => {
    const broken = LOG.replace('10,02;1;0;2,5', '10,02;1;0;junk');
    const ignoring: ColumnMapping = { ...MAPPING, columns: MAPPING.columns.map((c) => (c.column === 'p_bar' ? { column: 'p_bar', tag: '', word: '', role: 'ignore' } : c)) };
    const result = applyMapping(table(broken), ignoring, { ambientPa: AMBIENT_PA });
    expect(result.ok && result.log.signals.map((s) => s.tag)).toEqual(['S1', '1B2']);
  });

  it('refuses time going backwards, and an unreadable time, on their rows', () => {
    const result = applyMapping(table('time,S1\n0.0,0\n0.2,1\n0.1,0\nsoon,1\n'), { time: { column: 'time', format: 'seconds' }, columns: [{ column: 'S1', tag: 'S1', word: 'pressed', role: 'command' }] }, { ambientPa: AMBIENT_PA });
    expect(result).toEqual({
      ok: false,
      errors: [
        { row: 4, column: 'time', message: 'Time goes backwards: 0.1 s after 0.2 s on the row before.' },
        { row: 5, column: 'time', message: "'soon' is not a time in seconds." },
      ],
    });
  });

  it('refuses a pressure below vacuum (a wrong unit)', () => {
    const result = applyMapping(table('t,p\n0,-2\n'), { time: { column: 't', format: 'seconds' }, columns: [{ column: 'p', tag: '1A1', word: 'pressure:A', role: 'observation', unit: 'bar-gauge' }] }, { ambientPa: AMBIENT_PA });
    expect(result.ok).toBe(false);
    expect(!result.ok && result.errors[0]).toMatchObject({ row: 2, column: 'p' });
  });

  it('refuses a mapping that names a column the log lacks, or records one tag and word twice', () => {
    const result = applyMapping(table(LOG), { ...MAPPING, columns: [...MAPPING.columns, { column: 'S9', tag: '1B2', word: 'on', role: 'observation' }] }, { ambientPa: AMBIENT_PA });
    expect(!result.ok && result.errors).toEqual([
      { row: 1, column: 'S9', message: "1B2 on is already recorded by '1B2'" },
      { row: 1, column: 'S9', message: "the log has no column 'S9'" },
    ]);
  });
});
