import { describe, expect, it } from 'vitest';
import { parseLog } from '@/lib/field-logs/parse-log';
import type { LogError, LogTable } from '@/lib/field-logs/types';

function table(input: string | Uint8Array, fileName = 'log.csv'): LogTable {
  const result = parseLog(input, fileName);
  if (!result.ok) throw new Error(`expected a table, got ${JSON.stringify(result.errors)}`);
  return result.table;
}

function errors(input: string | Uint8Array, fileName = 'log.csv'): LogError[] {
  const result = parseLog(input, fileName);
  if (result.ok) throw new Error('expected errors, got a table');
  return result.errors;
}

const bytes = (text: string) => new TextEncoder().encode(text);

describe('parseLog: CSV', () => {
  it.each([
    [',', 'time,S1,1B2\n0.00,0,0\n0.01,1,0\n'],
    [';', 'time;S1;1B2\n0.00;0;0\n0.01;1;0\n'],
    ['\t', 'time\tS1\t1B2\n0.00\t0\t0\n0.01\t1\t0\n'],
  ])('finds the separator %j and splits header and rows by it', (separator, text) => {
    const t = table(text);
    expect(t.format).toBe('csv');
    expect(t.separator).toBe(separator);
    expect(t.columns).toEqual(['time', 'S1', '1B2']);
    expect(t.rows).toEqual([
      ['0.00', '0', '0'],
      ['0.01', '1', '0'],
    ]);
    expect(t.rowLines).toEqual([2, 3]);
    expect(t.decimalComma).toBe(false);
  });

  it('takes decimal commas in a semicolon file whose numbers read 1,25', () => {
    const t = table('time;p_bar\n0,00;1,25\n0,01;1,5\n');
    expect(t.separator).toBe(';');
    expect(t.decimalComma).toBe(true);
    expect(t.rows[0]).toEqual(['0,00', '1,25']);
  });

  it('takes decimal commas in a tab file too, but not in a semicolon file with decimal points', () => {
    expect(table('time\tp\n0,5\t1,25\n').decimalComma).toBe(true);
    expect(table('time;p\n0.5;1.25\n').decimalComma).toBe(false);
  });

  it('reads quoted cells: separators and line breaks inside, doubled quotes, and counts lines across them', () => {
    const t = table('time,"note, free text",S1\n0,"say ""hi""",0\n1,"two\nlines",1\n2,plain,0\n');
    expect(t.columns).toEqual(['time', 'note, free text', 'S1']);
    expect(t.rows).toEqual([
      ['0', 'say "hi"', '0'],
      ['1', 'two\nlines', '1'],
      ['2', 'plain', '0'],
    ]);
    expect(t.rowLines).toEqual([2, 3, 5]);
  });

  it('strips a byte order mark from bytes and from text', () => {
    const withBom = new Uint8Array([0xef, 0xbb, 0xbf, ...bytes('time,S1\n0,1\n')]);
    expect(table(withBom).columns).toEqual(['time', 'S1']);
    expect(table('\ufefftime,S1\n0,1\n').columns).toEqual(['time', 'S1']);
  });

  it('ignores blank trailing lines and reads CRLF line ends', () => {
    const t = table('time,S1\r\n0,0\r\n0.5,1\r\n\r\n\r\n  \n');
    expect(t.rows).toEqual([
      ['0', '0'],
      ['0.5', '1'],
    ]);
  });

  it('drops the empty last column a trailing separator on every line makes', () => {
    const t = table('time;S1;\n0;0;\n1;1;\n');
    expect(t.columns).toEqual(['time', 'S1']);
    expect(t.rows).toEqual([
      ['0', '0'],
      ['1', '1'],
    ]);
  });

  it.each([
    ['seconds with decimals', 'time,S1\n12.345,0\n12.355,1\n', 'time', 'seconds'],
    ['whole seconds, one a second', 'time,S1\n0,0\n1,1\n2,0\n', 'time', 'seconds'],
    ['whole milliseconds', 'time,S1\n0,0\n10,1\n20,0\n', 'time', 'milliseconds'],
    ['large milliseconds', 'stamp,S1\n1796000000000,0\n1796000000010,1\n', 'stamp', 'milliseconds'],
    ['seconds since 1970', 'ts,S1\n1796000000,0\n1796000001,1\n', 'ts', 'seconds'],
    ['a unit in the name', 'time [s],S1\n0,0\n10,1\n', 'time [s]', 'seconds'],
    ['ISO 8601 in UTC', 'when,S1\n2026-11-28T14:03:12.250Z,0\n2026-11-28T14:03:12.260Z,1\n', 'when', 'iso8601'],
    ['ISO 8601 with offsets', 'Timestamp,S1\n2026-11-28T15:03:12.250+01:00,0\n2026-11-28T15:03:12.260+0100,1\n', 'Timestamp', 'iso8601'],
    ['a first column that never goes down', 'clk_count,S1\n0.0,0\n0.5,1\n', 'clk_count', 'seconds'],
  ])('guesses the time column and its format: %s', (_, text, column, format) => {
    const t = table(text);
    expect(t.timeColumnGuess).toBe(column);
    expect(t.timeFormatGuess).toBe(format);
  });

  it('guesses no time column when nothing reads as one', () => {
    const t = table('S1,1B2\non,off\noff,on\n');
    expect(t.timeColumnGuess).toBeNull();
    expect(t.timeFormatGuess).toBeNull();
  });
});

describe('parseLog: JSON lines', () => {
  it('makes columns of the keys, the union in first-seen order, with missing keys empty', () => {
    const text = '{"t": 0, "S1": false}\n\n{"t": 0.25, "1B2": "on", "S1": true}\n{"t": 0.5, "p": 5.5, "S1": null}\n';
    const t = table(text, 'log.jsonl');
    expect(t.format).toBe('jsonl');
    expect(t.columns).toEqual(['t', 'S1', '1B2', 'p']);
    expect(t.rows).toEqual([
      ['0', 'false', '', ''],
      ['0.25', 'true', 'on', ''],
      ['0.5', '', '', '5.5'],
    ]);
    expect(t.rowLines).toEqual([1, 3, 4]);
    expect(t.separator).toBeUndefined();
    expect(t.timeColumnGuess).toBe('t');
    expect(t.timeFormatGuess).toBe('seconds');
  });

  it('reads .ndjson, and .txt by its content', () => {
    expect(table('{"time":"2026-11-28T14:03:12Z","S1":1}\n', 'log.ndjson').format).toBe('jsonl');
    expect(table('{"time":"2026-11-28T14:03:12Z","S1":1}\n', 'export.txt').format).toBe('jsonl');
    expect(table('time;S1\n0;1\n', 'export.txt').format).toBe('csv');
  });

  it('names the line that is not JSON, and a line that is not an object', () => {
    expect(errors('{"t":0}\n{"t":1\n[1,2]\n{"t":2}\n', 'log.jsonl')).toEqual([
      { row: 2, column: null, message: 'This line is not valid JSON.' },
      { row: 3, column: null, message: expect.stringContaining('one JSON object') },
    ]);
  });
});

describe('parseLog: malformed files', () => {
  it('reports a row with the wrong number of cells by its line', () => {
    expect(errors('time,S1,1B2\n0,0,0\n1,1\n2,0,0,9\n')).toEqual([
      { row: 3, column: null, message: 'Expected 3 cells as in the header, found 2.' },
      { row: 4, column: null, message: 'Expected 3 cells as in the header, found 4.' },
    ]);
  });

  it.each([
    ['an empty string', ''],
    ['only blank lines', '\n \n\r\n'],
  ])('refuses an empty file: %s', (_, text) => {
    expect(errors(text)).toEqual([{ row: 1, column: null, message: 'The file is empty.' }]);
    expect(errors(bytes(text))).toEqual([{ row: 1, column: null, message: 'The file is empty.' }]);
  });

  it('refuses a file whose first line holds values instead of a header', () => {
    expect(errors('0.00;0;1,5\n0.01;1;1,6\n')).toEqual([{ row: 1, column: null, message: expect.stringContaining('needs a header row') }]);
  });

  it('refuses a header with no rows under it', () => {
    expect(errors('time,S1\n')).toEqual([{ row: 1, column: null, message: 'The log has a header but no data rows.' }]);
  });

  it('refuses a nameless or repeated column name', () => {
    expect(errors('time,,S1,S1\n0,0,0,0\n')).toEqual([
      { row: 1, column: null, message: 'Column 2 of the header has no name.' },
      { row: 1, column: 'S1', message: "The column name 'S1' appears twice in the header." },
    ]);
  });

  it('refuses a blank line inside the data', () => {
    expect(errors('time,S1\n0,0\n\n1,1\n')).toEqual([{ row: 3, column: null, message: 'Blank line inside the data.' }]);
  });

  it('names the line where a quote is never closed', () => {
    expect(errors('time,S1\n0,0\n1,"open\n2,0\n')).toEqual([{ row: 3, column: null, message: expect.stringContaining('never closed') }]);
  });

  it('refuses binary content: a NUL byte, on its line, in bytes and in text', () => {
    expect(errors(new Uint8Array([...bytes('time,S1\n0,1\n'), 0, 1, 2]))).toEqual([{ row: 3, column: null, message: expect.stringContaining('NUL byte') }]);
    expect(errors('time,S1\n\0')).toEqual([{ row: 2, column: null, message: expect.stringContaining('NUL byte') }]);
  });

  it.each([
    ['a lone continuation byte', [0x80]],
    ['a truncated sequence', [0xe2, 0x82]],
    ['an overlong encoding', [0xc0, 0xaf]],
    ['a surrogate', [0xed, 0xa0, 0x80]],
    ['Latin-1 text', [0x5a, 0x65, 0x69, 0x74, 0xe4]],
  ])('refuses bytes that are not UTF-8: %s, on its line', (_, bad) => {
    expect(errors(new Uint8Array([...bytes('time,S1\n0,1\n'), ...bad]))).toEqual([{ row: 3, column: null, message: expect.stringContaining('not UTF-8') }]);
  });

  it('reads multi-byte UTF-8 names', () => {
    expect(table(bytes('Zeit,Druck µ,€\n0,1,2\n')).columns).toEqual(['Zeit', 'Druck µ', '€']);
  });

  it('stops after 20 errors and says how many more there were', () => {
    const text = `time,S1\n${Array.from({ length: 25 }, (_, i) => `${i}`).join('\n')}\n`;
    const list = errors(text);
    expect(list).toHaveLength(21);
    expect(list[0]).toEqual({ row: 2, column: null, message: 'Expected 2 cells as in the header, found 1.' });
    expect(list[19]!.row).toBe(21);
    expect(list[20]).toEqual({ row: 22, column: null, message: 'and 5 more problems (the first at line 22)' });
  });
});
