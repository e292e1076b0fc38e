import 'server-only';
import { createHash } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { DEMO_LOGS } from '@/demo/plant';

/**
 * The seeded demo logs are stored lazily. The seed runs before the local S3 stand-in starts (in
 * `npm start` and in `npm test`), so it writes only the row, under a key naming the upload and
 * the file's SHA-256; the first read that finds no object puts the file from demo/logs there.
 * Only keys of this form whose hash matches one of the demo files are restored, so no other key
 * can be made to read from disk, and a demo file edited since the seed is not passed off as the
 * logged bytes.
 */
const DEMO_KEY = /^logs\/[0-9a-f-]{36}\/demo\/([0-9a-f]{64})$/;

export function demoLogKey(uploadId: string, sha256: string): string {
  return `logs/${uploadId}/demo/${sha256}`;
}

export function sha256Hex(bytes: Uint8Array): string {
  return createHash('sha256').update(bytes).digest('hex');
}

export async function readDemoLogFile(file: string): Promise<Uint8Array> {
  return readFile(path.join(process.cwd(), 'demo', 'logs', file));
}

/** The demo file stored under `key`, or null when `key` is not a demo key or no demo file has that hash. */
export async function demoLogBytes(key: string): Promise<Uint8Array | null> {
  const wanted = DEMO_KEY.exec(key)?.[1];
  if (!wanted) return null;
  for (const demo of DEMO_LOGS) {
    const bytes = await readDemoLogFile(demo.file).catch(() => null);
    if (bytes && sha256Hex(bytes) === wanted) return bytes;
  }
  return null;
}
