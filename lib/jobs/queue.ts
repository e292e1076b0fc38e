import PgBoss from 'pg-boss';
import { serverEnv } from '@/lib/env';

/** The queue of proof searches; a job's data names the proof row it works. */
export const PROOF_QUEUE = 'proof-search';

export interface ProofJob {
  proofId: string;
}

/**
 * Longest a proof may run before pg-boss counts its worker as gone (its limit is 24 h). A worker
 * that dies mid-proof is then failed, not retried: a proof is started again by hand.
 */
const PROOF_EXPIRE_S = 6 * 60 * 60;

/** The queue of fault searches over a field log; a job's data names the fault_searches row. */
export const FAULT_SEARCH_QUEUE = 'fault-search';

export interface FaultSearchJob {
  faultSearchId: string;
}

/** Longest a fault search may run before pg-boss counts its worker as gone; failed then, not retried. */
const FAULT_SEARCH_EXPIRE_S = 2 * 60 * 60;

const holder = globalThis as unknown as { airproofBoss?: Promise<PgBoss> };

async function startBoss(): Promise<PgBoss> {
  // A few connections: a web process only sends, a worker fetches one job at a time.
  const boss = new PgBoss({ connectionString: serverEnv().DATABASE_URL, max: 4, application_name: 'airproof-jobs' });
  boss.on('error', (error) => console.error('[airproof] job queue error', error));
  await boss.start();
  // Queues must exist before jobs are sent to them (pg-boss 10); creating one again changes nothing.
  await boss.createQueue(PROOF_QUEUE, { name: PROOF_QUEUE, retryLimit: 0, expireInSeconds: PROOF_EXPIRE_S });
  await boss.createQueue(FAULT_SEARCH_QUEUE, { name: FAULT_SEARCH_QUEUE, retryLimit: 0, expireInSeconds: FAULT_SEARCH_EXPIRE_S });
  return boss;
}

/** The one pg-boss of this process against DATABASE_URL, started (and its schema installed) on first use. */
function getBoss(): Promise<PgBoss> {
  holder.airproofBoss ??= startBoss().catch((error: unknown) => {
    // A failed start is not kept, so the next call tries again once the database answers.
    holder.airproofBoss = undefined;
    throw error;
  });
  return holder.airproofBoss;
}

/** Sends a proof to the workers; the job id. */
export async function sendProofJob(job: ProofJob): Promise<string> {
  const boss = await getBoss();
  const id = await boss.send(PROOF_QUEUE, job);
  // Only singleton and throttled sends come back without an id; the proof queue uses neither.
  if (!id) throw new Error(`pg-boss did not accept the job for proof ${job.proofId}`);
  return id;
}

/** Sends a fault search to the workers; the job id. */
export async function sendFaultSearchJob(job: FaultSearchJob): Promise<string> {
  const boss = await getBoss();
  const id = await boss.send(FAULT_SEARCH_QUEUE, job);
  if (!id) throw new Error(`pg-boss did not accept the job for fault search ${job.faultSearchId}`);
  return id;
}

/** How often an idle worker asks a queue for a job (pg-boss's least is 0.5 s). */
const POLL_S = 1;

/** A queue worked in this process. */
export interface QueueWorker {
  /** Stops taking jobs, lets the one in hand see that it should stop and waits for it, then runs the worker's own closing. */
  stop(): Promise<void>;
}

/**
 * Works one queue in this process, one job at a time: `handle` gets the job's data and a
 * question it asks while working (has stop() been called?). `close` runs once the job in hand
 * has ended (the worker's threads, say).
 */
export async function workQueue<T extends object>(queue: string, handle: (data: T, isStopping: () => boolean) => Promise<void>, close: () => Promise<void> = async () => {}): Promise<QueueWorker> {
  const boss = await getBoss();
  let stopping = false;
  let inHand: Promise<void> | null = null;
  await boss.work<T>(queue, { batchSize: 1, pollingIntervalSeconds: POLL_S }, async ([job]) => {
    if (!job) return;
    inHand = handle(job.data, () => stopping);
    try {
      await inHand;
    } finally {
      inHand = null;
    }
  });
  return {
    async stop() {
      stopping = true;
      await boss.offWork(queue);
      await inHand;
      await close();
    },
  };
}

/** Stops this process's pg-boss, waiting for jobs still being worked, and closes its connections. */
export async function stopBoss(): Promise<void> {
  const started = holder.airproofBoss;
  holder.airproofBoss = undefined;
  if (started) await (await started.catch(() => null))?.stop({ graceful: true, wait: true });
}
