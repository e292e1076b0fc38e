import { describe, expect, it } from 'vitest';
import { MemoryTraceSink } from '@/engine/trace/trace';

const STATS = { steps: 0, rejectedSteps: 0, massBalanceErrorKg: 0 };

describe('MemoryTraceSink', () => {
  it('turns rows into one column per signal, across the blocks it stores them in', () => {
    const sink = new MemoryTraceSink();
    sink.begin([
      { name: 'a', unit: 'Pa' },
      { name: 'b', unit: 'm' },
    ]);
    const row = new Float64Array(2);
    // 600 rows: more than two blocks, so the copy into a block and the walk over blocks are both seen.
    for (let k = 0; k < 600; k += 1) {
      row[0] = k;
      row[1] = -2 * k;
      sink.sample(k * 0.01, row);
    }
    const trace = sink.toTrace(0.01, STATS);
    expect(trace.time).toHaveLength(600);
    expect(trace.signals.map((s) => s.name)).toEqual(['a', 'b']);
    expect(trace.signals[0]!.values.slice(254, 259)).toEqual([254, 255, 256, 257, 258]);
    expect(trace.signals[1]!.values[599]).toBe(-1198);
  });

  it('refuses a row that does not hold one value per signal', () => {
    const sink = new MemoryTraceSink();
    sink.begin([{ name: 'a', unit: 'Pa' }]);
    expect(() => sink.sample(0, new Float64Array(2))).toThrow(/one value per signal \(1\), got 2/);
  });
});
