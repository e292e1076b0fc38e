import { describe, expect, it } from 'vitest';
import { plotSignals, runCsv } from '@/components/editor/run/plot-signals';
import type { RunTrace } from '@/components/editor/run/run-frame';
import { emptyDocument } from '@/engine/document/schema';

const document = {
  ...emptyDocument(),
  components: [
    { id: 'v', type: 'valve-5-2', tag: '1V1', parameters: {}, position: { x: 0, y: 0 }, rotation: 0 as const, mirrored: false },
    { id: 'c', type: 'cylinder-double-acting', tag: '1A1', parameters: {}, position: { x: 0, y: 0 }, rotation: 0 as const, mirrored: false },
  ],
};
const trace: RunTrace = {
  intervalS: 0.01,
  time: Float64Array.from([0, 0.01]),
  names: ['v:p:4', 'c:x', 'c:v', 'v:q:1-4', 'v:position'],
  columns: [Float64Array.from([101_325, 701_325]), Float64Array.from([0, 0.025]), Float64Array.from([0, 0.5]), Float64Array.from([0, 1e-3]), Float64Array.from([1, 0])],
  highestPa: 701_325,
};

describe('run plots and export', () => {
  it('offers pressures in bar gauge, travel in mm, speed in mm/s and states, named by tag; flows are left to the CSV', () => {
    const signals = plotSignals(trace, document);
    expect(signals.map((s) => [s.name, s.label, s.unit])).toEqual([
      ['v:p:4', '1V1 port 4', 'bar (gauge)'],
      ['c:x', '1A1 position', 'mm'],
      ['c:v', '1A1 speed', 'mm/s'],
      ['v:position', '1V1 position', 'state'],
    ]);
    expect(signals[0]!.fromSi(701_325)).toBeCloseTo(6, 12);
    expect(signals[1]!.fromSi(0.025)).toBeCloseTo(25, 12);
    expect(signals[2]!.fromSi(0.5)).toBeCloseTo(500, 12);
  });

  it('exports every signal in SI units, one row per output time', () => {
    expect(runCsv(trace)).toBe('time_s,v:p:4,c:x,c:v,v:q:1-4,v:position\n0,101325,0,0,0,1\n0.01,701325,0.025,0.5,0.001,0\n');
  });

  it('writes single-precision values to the digits they hold, not the float noise', () => {
    const stored = { ...trace, columns: trace.columns.map((c) => Float32Array.from(c)) };
    // 0.025 in single precision reads back as 0.02500000037252903.
    expect(stored.columns[1]![1]).not.toBe(0.025);
    expect(runCsv(stored)).toBe(runCsv(trace));
  });
});
