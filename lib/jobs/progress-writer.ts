import 'server-only';
import type { JobStatus } from '@/models';

/** Least time between two progress writes of one search; each write also reads whether it was cancelled. */
const PROGRESS_WRITE_MS = 500;

/** Seconds still to go at the rate so far; null before the first piece of work is done. */
export function estimateS(done: number, total: number, elapsedS: number): number | null {
  return done > 0 ? (elapsedS * Math.max(0, total - done)) / done : null;
}

/**
 * Passes a search's progress to its row at most every PROGRESS_WRITE_MS, one write at a time, and
 * learns from each write whether the row was cancelled meanwhile (the search asks `cancelled`
 * between batches). `settle()` waits for a write still under way.
 */
export function progressWriter<P>(write: (progress: P) => Promise<JobStatus>, what: string) {
  let cancelled = false;
  let latest: P | null = null;
  let lastWriteAt = 0;
  let writing: Promise<void> | null = null;
  return {
    report(progress: P): void {
      latest = progress;
      const now = Date.now();
      if (writing || now - lastWriteAt < PROGRESS_WRITE_MS) return;
      lastWriteAt = now;
      writing = write(progress)
        .then((status) => {
          cancelled = status === 'cancelled';
        })
        .catch((error: unknown) => console.error(`[airproof] could not write the progress of ${what}`, error))
        .finally(() => {
          writing = null;
        });
    },
    get cancelled(): boolean {
      return cancelled;
    },
    get latest(): P | null {
      return latest;
    },
    async settle(): Promise<void> {
      await writing;
    },
  };
}
