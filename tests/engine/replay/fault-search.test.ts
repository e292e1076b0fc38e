import { describe, expect, it } from 'vitest';
import type { CircuitDocument } from '@/engine/document/schema';
import { applyFault, faultsFor } from '@/engine/faults';
import { evaluateFaultTask, faultSearch, recordTrace, replayLog, type FaultSearchProgress, type FaultTask, type RecordedLog } from '@/engine/replay';
import { demoDocument } from '@/tests/support/demo-circuits';

const healthy: CircuitDocument = demoDocument('lid-press-relay-control');

const script: RecordedLog = { durationS: 2.5, signals: [{ tag: 'S1', word: 'pressed', role: 'command', kind: 'state', times: [0, 0.2, 0.4], values: [0, 1, 0] }] };

function logOf(machine: CircuitDocument): RecordedLog {
  const { trace, inputs } = replayLog(machine, script);
  return recordTrace(machine, trace, inputs, {
    commands: [{ tag: 'S1', word: 'pressed' }],
    observations: [
      { tag: '1B2', word: 'on', kind: 'state' },
      { tag: '1A1', word: 'retracted', kind: 'state' },
    ],
    durationS: script.durationS,
  });
}

const pick = (...ids: string[]) => faultsFor(healthy).filter((c) => ids.includes(`${c.faultId} ${c.tag}`));

describe('evaluateFaultTask', () => {
  it('scores the machine itself 0 and a different throttle setting worse', () => {
    const log = logOf(applyFault(healthy, { faultId: 'throttle-setting', tag: '1V2', severity: 0.5 }));
    const same = evaluateFaultTask({ document: healthy, log, faults: [{ faultId: 'throttle-setting', tag: '1V2', severity: 0.5 }] });
    const drawn = evaluateFaultTask({ document: healthy, log, faults: [] });
    expect(same.score).toBeCloseTo(0, 9);
    expect(same.match).toBeCloseTo(100, 6);
    expect(drawn.score).toBeGreaterThan(50);
  });

  it('lets a log that does not fit the drawing fail on the healthy run', () => {
    const log: RecordedLog = { ...script, signals: [...script.signals, { tag: 'X9', word: 'on', role: 'observation', kind: 'state', times: [0], values: [0] }] };
    expect(() => evaluateFaultTask({ document: healthy, log, faults: [] })).toThrow(/X9/);
  });
});

describe('faultSearch', () => {
  const log = logOf(applyFault(healthy, { faultId: 'throttle-setting', tag: '1V2', severity: 0.5 }));
  const faults = pick('throttle-setting 1V2', 'spool-stuck 1V1', 'supply-low 0Z1');

  it('hands serialisable tasks to runBatch, reports progress to the total and ranks the fitted fault first', async () => {
    expect(faults).toHaveLength(3);
    const seen: FaultTask[][] = [];
    const progress: FaultSearchProgress[] = [];
    const result = await faultSearch(healthy, log, {
      faults,
      coarsePoints: 5,
      refineSteps: 4,
      batchSize: 4,
      runBatch: async (tasks) => {
        seen.push(tasks);
        // As a worker thread would get them: through structured data only.
        return tasks.map((t) => evaluateFaultTask(JSON.parse(JSON.stringify(t)) as FaultTask));
      },
      onProgress: (p) => progress.push(p),
    });
    expect(seen.every((batch) => batch.length <= 4)).toBe(true);
    expect(seen[0]).toHaveLength(1);
    expect(seen[0]![0]!.faults).toEqual([]);
    // The stuck spool is on-off: run once, at severity 1.
    const stuck = seen.flat().filter((t) => t.faults[0]?.faultId === 'spool-stuck');
    expect(stuck.map((t) => t.faults[0]!.severity)).toEqual([1]);
    const runs = seen.flat().length;
    expect(result.evaluated).toBe(runs);
    expect(runs).toBeLessThanOrEqual(1 + 1 + 2 * (5 + 2 * 4));
    const last = progress[progress.length - 1]!;
    expect(last.done).toBe(last.total);
    expect(progress.map((p) => p.done)).toEqual([...progress.map((p) => p.done)].sort((a, b) => a - b));
    expect(result.complete).toBe(true);
    expect(result.candidates.map((c) => c.score)).toEqual([...result.candidates.map((c) => c.score)].sort((a, b) => a - b));
    const best = result.candidates[0]!;
    expect([best.faultId, best.tag]).toEqual(['throttle-setting', '1V2']);
    expect(best.severity).toBeCloseTo(0.5, 1);
    expect(best.improvement).toBeCloseTo(result.baseline.score - best.score, 9);
    expect(best.explanation).toMatch(/^1V2 is set to .* open\. This explains the log best: match \d+ % \(healthy model: \d+ %\)\.$/);
    expect(last.best).toMatchObject({ faultId: 'throttle-setting', tag: '1V2' });
  });

  it('stops between batches when asked, saying the result is incomplete', async () => {
    let batches = 0;
    const result = await faultSearch(healthy, log, {
      faults,
      batchSize: 2,
      runBatch: async (tasks) => {
        batches += 1;
        return tasks.map(evaluateFaultTask);
      },
      shouldStop: () => batches >= 3,
    });
    expect(result.complete).toBe(false);
    expect(batches).toBe(3);
    expect(result.evaluated).toBe(1 + 2 + 2);
  });
});
