import 'server-only';
import { getSequelize } from '@/lib/db';
import packageJson from '@/package.json';

export interface HealthReport {
  status: 'ok' | 'degraded';
  version: string;
  database: { ok: boolean; latencyMs?: number; reason?: string };
}

/** Checks the database with a real round trip, bounded so a hung server reports rather than hangs. */
export async function checkHealth({ timeoutMs = 3000 }: { timeoutMs?: number } = {}): Promise<HealthReport> {
  const started = performance.now();
  try {
    await Promise.race([
      getSequelize().query('select 1'),
      new Promise((_, reject) => setTimeout(() => reject(new Error(`no answer within ${timeoutMs} ms`)), timeoutMs)),
    ]);
    return { status: 'ok', version: packageJson.version, database: { ok: true, latencyMs: Math.round(performance.now() - started) } };
  } catch (error) {
    const reason = error instanceof Error ? error.message : 'unknown error';
    return { status: 'degraded', version: packageJson.version, database: { ok: false, reason } };
  }
}
