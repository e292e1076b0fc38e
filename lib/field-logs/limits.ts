import type { LogError, LogFormat } from './types';

/** The largest log accepted, bytes (20 MiB: weeks of 10 ms samples of a dozen signals fit well under it). */
export const MAX_LOG_BYTES = 20 * 1024 * 1024;

/** File name endings accepted for a field log, lower case. */
export const LOG_EXTENSIONS = ['.csv', '.txt', '.jsonl', '.ndjson'] as const;

/** The format a file name promises; null when its ending is not accepted. `.txt` is decided by content. */
export function logFormatFromName(fileName: string): LogFormat | 'by-content' | null {
  const name = fileName.toLowerCase();
  if (name.endsWith('.csv')) return 'csv';
  if (name.endsWith('.jsonl') || name.endsWith('.ndjson')) return 'jsonl';
  if (name.endsWith('.txt')) return 'by-content';
  return null;
}

export type SniffResult = { ok: true; format: LogFormat; text: string } | { ok: false; error: LogError };

/**
 * Refuses content that is not text (a NUL byte, or bytes that are not UTF-8) and guesses the
 * format from the first non-blank line: a JSON object starts JSON lines, anything else is CSV.
 * The text comes back decoded, without a byte order mark.
 */
export function sniffLogType(bytes: Uint8Array): SniffResult {
  const nul = bytes.indexOf(0);
  if (nul >= 0) return { ok: false, error: { row: lineAt(bytes, nul), column: null, message: 'This is not a text file: it holds a NUL byte. Export the log as CSV or JSON lines.' } };
  const bad = firstInvalidUtf8(bytes);
  if (bad >= 0) return { ok: false, error: { row: lineAt(bytes, bad), column: null, message: 'This is not UTF-8 text. Export the log as CSV or JSON lines in UTF-8.' } };
  const text = stripBom(new TextDecoder('utf-8').decode(bytes));
  return { ok: true, format: formatFromText(text), text };
}

export function stripBom(text: string): string {
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

export function formatFromText(text: string): LogFormat {
  return text.trimStart().startsWith('{') ? 'jsonl' : 'csv';
}

function lineAt(bytes: Uint8Array, index: number): number {
  let line = 1;
  for (let i = 0; i < index; i += 1) if (bytes[i] === 0x0a) line += 1;
  return line;
}

/** Index of the first byte that breaks UTF-8 (RFC 3629: no overlongs, surrogates or code points past U+10FFFF), or -1. */
function firstInvalidUtf8(bytes: Uint8Array): number {
  let i = 0;
  while (i < bytes.length) {
    const b = bytes[i]!;
    if (b < 0x80) {
      i += 1;
      continue;
    }
    let need: number;
    let min: number;
    let cp: number;
    if (b >= 0xc2 && b <= 0xdf) [need, min, cp] = [1, 0x80, b & 0x1f];
    else if (b >= 0xe0 && b <= 0xef) [need, min, cp] = [2, 0x800, b & 0x0f];
    else if (b >= 0xf0 && b <= 0xf4) [need, min, cp] = [3, 0x10000, b & 0x07];
    else return i;
    for (let k = 1; k <= need; k += 1) {
      const c = bytes[i + k];
      if (c === undefined || (c & 0xc0) !== 0x80) return i;
      cp = (cp << 6) | (c & 0x3f);
    }
    if (cp < min || cp > 0x10ffff || (cp >= 0xd800 && cp <= 0xdfff)) return i;
    i += need + 1;
  }
  return -1;
}
