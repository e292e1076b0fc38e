import { describe, expect, it } from 'vitest';
import { LOG_EXTENSIONS, MAX_LOG_BYTES, logFormatFromName, sniffLogType } from '@/lib/field-logs/limits';

const bytes = (text: string) => new TextEncoder().encode(text);

describe('log limits', () => {
  it('accepts 20 MiB and the four endings, in any case', () => {
    expect(MAX_LOG_BYTES).toBe(20 * 1024 * 1024);
    expect(LOG_EXTENSIONS).toEqual(['.csv', '.txt', '.jsonl', '.ndjson']);
    expect(['a.CSV', 'b.jsonl', 'c.NDJSON', 'd.txt', 'e.xlsx', 'f.csv.gz', 'csv'].map(logFormatFromName)).toEqual(['csv', 'jsonl', 'jsonl', 'by-content', null, null, null]);
  });

  it('sniffs text: JSON lines when the first non-blank line is an object, CSV otherwise, without the BOM', () => {
    expect(sniffLogType(bytes('\n  {"t":0}\n'))).toEqual({ ok: true, format: 'jsonl', text: '\n  {"t":0}\n' });
    expect(sniffLogType(new Uint8Array([0xef, 0xbb, 0xbf, ...bytes('t;S1\n')]))).toEqual({ ok: true, format: 'csv', text: 't;S1\n' });
  });

  it('refuses binary content: an image header, a NUL byte, bytes that are not UTF-8', () => {
    const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d]);
    // The PNG signature holds two line feeds before its first NUL byte.
    expect(sniffLogType(png)).toMatchObject({ ok: false, error: { row: 3, column: null } });
    expect(sniffLogType(bytes('a\nb\nc\0'))).toMatchObject({ ok: false, error: { row: 3, message: expect.stringContaining('NUL') } });
    expect(sniffLogType(new Uint8Array([0x61, 0xf5, 0x80, 0x80, 0x80]))).toMatchObject({ ok: false, error: { row: 1, message: expect.stringContaining('UTF-8') } });
  });

  it('passes every UTF-8 length, up to the last code point', () => {
    const text = 'a é € 𝄞 \u{10FFFF}';
    expect(sniffLogType(bytes(text))).toEqual({ ok: true, format: 'csv', text });
  });
});
