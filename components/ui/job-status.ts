import type { JobStatus } from '@/models/job-status';

/** How a search waiting for or worked by a job worker stands, in words. */
export const JOB_STATUS_LABEL: Record<JobStatus, string> = {
  queued: 'waiting for a worker',
  running: 'searching',
  succeeded: 'finished',
  failed: 'could not finish',
  cancelled: 'stopped',
};

/** Work still has a way to go while it waits for a worker or is being worked. */
export const isJobActive = (status: JobStatus): boolean => status === 'queued' || status === 'running';

/** How often a page asks after work that is still going, ms. */
export const JOB_POLL_MS = 700;

/** The time still to go, when there is an estimate and the work is still going. */
export function timeToGo(estimateS: number | null, status: JobStatus): string {
  return estimateS !== null && isJobActive(status) ? ` · about ${Math.ceil(estimateS)} s to go` : '';
}
