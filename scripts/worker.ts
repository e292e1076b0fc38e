// `npm run worker`: works the proof and fault-search queues until SIGINT or SIGTERM. It answers
// GET /health on WORKER_HEALTH_URL (scripts/local-env.sh) so that start.sh and Playwright can wait for it.
import { createServer } from 'node:http';
import { availableParallelism } from 'node:os';
import { closeSequelize } from '@/lib/db';
import { startFaultWorker } from '@/lib/jobs/fault-worker';
import { startProofWorker } from '@/lib/jobs/proof-worker';
import { stopBoss } from '@/lib/jobs/queue';

/** Threads for the engine: every core but one, which the web server and the database share (override with WORKER_THREADS). */
function threadCount(): number {
  const asked = Number(process.env.WORKER_THREADS);
  return Number.isInteger(asked) && asked >= 1 ? asked : Math.max(1, availableParallelism() - 1);
}

async function main(): Promise<void> {
  const threads = threadCount();
  const worker = await startProofWorker({ threads });
  // Both share the threads' cores: a proof and a fault search at once each run at about half speed.
  const faultWorker = await startFaultWorker({ threads });
  const health = createServer((request, response) => {
    const ok = request.url === '/health';
    response.writeHead(ok ? 200 : 404, { 'content-type': 'application/json' });
    response.end(JSON.stringify(ok ? { status: 'ok', threads } : { error: 'not found' }));
  });
  const healthUrl = process.env.WORKER_HEALTH_URL ? new URL(process.env.WORKER_HEALTH_URL) : null;
  if (healthUrl) await new Promise<void>((resolve) => health.listen(Number(healthUrl.port), healthUrl.hostname, resolve));
  console.log(`[airproof] proof and fault-search worker running with ${threads} thread${threads === 1 ? '' : 's'}${healthUrl ? `, health on ${healthUrl.origin}/health` : ''}`);

  let stopping = false;
  const stop = async (signal: string): Promise<void> => {
    if (stopping) return;
    stopping = true;
    console.log(`[airproof] proof worker stopping (${signal})`);
    health.close();
    await Promise.all([worker.stop(), faultWorker.stop()]);
    await stopBoss();
    await closeSequelize();
    process.exit(0);
  };
  process.on('SIGINT', (signal) => void stop(signal));
  process.on('SIGTERM', (signal) => void stop(signal));
}

main().catch(async (error: unknown) => {
  console.error(error);
  await closeSequelize();
  process.exit(1);
});
