import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { progressWriter } from '@/lib/jobs/progress-writer';
import type { JobStatus } from '@/models';

/** A database call the test answers by hand. */
function calls() {
  const made: Array<{ kind: 'write' | 'read'; progress?: number; answer: (status: JobStatus) => Promise<void>; fail: () => Promise<void> }> = [];
  const call = (kind: 'write' | 'read', progress?: number) =>
    new Promise<JobStatus>((resolve, reject) => {
      // Answering lets the writer's own .then/.finally run before the test goes on.
      const settle = () => new Promise<void>((r) => setImmediate(r));
      made.push({ kind, progress, answer: (status) => (resolve(status), settle()), fail: () => (reject(new Error('connection lost')), settle()) });
    });
  return { made, write: (p: number) => call('write', p), readStatus: () => call('read') };
}

describe('progressWriter', () => {
  beforeEach(() => {
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(new Date('2026-12-03T08:00:00Z'));
  });
  afterEach(() => vi.useRealTimers());

  it('writes at most every 0.5 s and only reads the status in between, one call at a time', async () => {
    const db = calls();
    const progress = progressWriter(db, 'test search');
    progress.report(1);
    progress.report(2); // the write is still under way: nothing more goes out
    expect(db.made.map((c) => [c.kind, c.progress])).toEqual([['write', 1]]);
    await db.made[0]!.answer('running');

    vi.advanceTimersByTime(100);
    progress.report(3);
    expect(db.made.map((c) => c.kind)).toEqual(['write', 'read']);
    await db.made[1]!.answer('running');
    expect(progress.cancelled).toBe(false);

    vi.advanceTimersByTime(400);
    progress.report(4);
    expect(db.made.map((c) => [c.kind, c.progress])).toEqual([['write', 1], ['read', undefined], ['write', 4]]);
    await db.made[2]!.answer('running');
    expect(progress.latest).toBe(4);
  });

  it('learns of a cancel from a status read well before the next write, and then stops calling', async () => {
    const db = calls();
    const progress = progressWriter(db, 'test search');
    progress.report(1);
    await db.made[0]!.answer('running');
    vi.advanceTimersByTime(50);
    progress.report(2);
    await db.made[1]!.answer('cancelled');
    expect(db.made[1]!.kind).toBe('read');
    expect(progress.cancelled).toBe(true);

    vi.advanceTimersByTime(1000);
    progress.report(3);
    expect(db.made).toHaveLength(2);
    expect(progress.latest).toBe(3);
  });

  it('keeps going when a call fails, and settle() waits for the call under way', async () => {
    const db = calls();
    const errors = vi.spyOn(console, 'error').mockImplementation(() => {});
    const progress = progressWriter(db, 'test search');
    progress.report(1);
    await db.made[0]!.fail();
    expect(errors).toHaveBeenCalledWith('[airproof] could not write the progress of test search', expect.any(Error));
    expect(progress.cancelled).toBe(false);

    vi.advanceTimersByTime(10);
    progress.report(2);
    let settled = false;
    const waiting = progress.settle().then(() => (settled = true));
    await new Promise((r) => setImmediate(r));
    expect(settled).toBe(false);
    await db.made[1]!.fail();
    await waiting;
    expect(errors).toHaveBeenLastCalledWith('[airproof] could not read the status of test search', expect.any(Error));
    errors.mockRestore();
  });
});
