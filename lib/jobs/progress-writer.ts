import 'server-only';
import type { JobStatus } from '@/models';

/** Least time between two progress writes of one search; each write also reads whether it was cancelled. */
const PROGRESS_WRITE_MS = 500;

/** Seconds still to go at the rate so far; null before the first piece of work is done. */
export function estimateS(done: number, total: number, elapsedS: number): number | null {
  return done > 0 ? (elapsedS * Math.max(0, total - done)) / done : null;
}

/**
 * Passes a search's progress to its row at most every PROGRESS_WRITE_MS and learns whether the row
 * was cancelled meanwhile (the search asks `cancelled` between batches). A report that comes
 * sooner than the next write only reads the status: a cancel then stops the search within a
 * batch or two instead of waiting for the next write, which a short search may never reach.
 * One database call at a time; `settle()` waits for one still under way.
 */
export function progressWriter<P>({ write, readStatus }: { write: (progress: P) => Promise<JobStatus>; readStatus: () => Promise<JobStatus> }, what: string) {
  let cancelled = false;
  let latest: P | null = null;
  let lastWriteAt = 0;
  let pending: Promise<void> | null = null;
  return {
    report(progress: P): void {
      latest = progress;
      if (pending || cancelled) return;
      const now = Date.now();
      const writing = now - lastWriteAt >= PROGRESS_WRITE_MS;
      if (writing) lastWriteAt = now;
      pending = (writing ? write(progress) : readStatus())
        .then((status) => {
          cancelled = status === 'cancelled';
        })
        .catch((error: unknown) => console.error(`[airproof] could not ${writing ? 'write the progress' : 'read the status'} of ${what}`, error))
        .finally(() => {
          pending = null;
        });
    },
    get cancelled(): boolean {
      return cancelled;
    },
    get latest(): P | null {
      return latest;
    },
    async settle(): Promise<void> {
      await pending;
    },
  };
}
