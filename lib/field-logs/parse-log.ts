import { parseCsv } from './csv';
import { parseJsonLines } from './jsonl';
import { formatFromText, logFormatFromName, sniffLogType, stripBom } from './limits';
import type { LogFormat, ParseLogResult } from './types';

/**
 * Reads an uploaded field log into a table of raw cells. Bytes are checked for binary content
 * and decoded as UTF-8; text is taken as it is. The format follows the file name (`.csv`,
 * `.jsonl`, `.ndjson`), or the content for `.txt` and unknown endings.
 */
export function parseLog(input: Uint8Array | string, fileName: string): ParseLogResult {
  let text: string;
  if (typeof input === 'string') {
    if (input.includes('\0')) return { ok: false, errors: [{ row: input.slice(0, input.indexOf('\0')).split('\n').length, column: null, message: 'This is not a text file: it holds a NUL byte. Export the log as CSV or JSON lines.' }] };
    text = stripBom(input);
  } else {
    const sniffed = sniffLogType(input);
    if (!sniffed.ok) return { ok: false, errors: [sniffed.error] };
    text = sniffed.text;
  }
  if (text.trim() === '') return { ok: false, errors: [{ row: 1, column: null, message: 'The file is empty.' }] };
  const byName = logFormatFromName(fileName);
  const format: LogFormat = byName === 'csv' || byName === 'jsonl' ? byName : formatFromText(text);
  return format === 'jsonl' ? parseJsonLines(text) : parseCsv(text);
}
