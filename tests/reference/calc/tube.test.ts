import { describe, expect, it } from 'vitest';
import { tubeVolume } from '@/engine/calc/tube';
import { pistonArea } from '@/engine/calc/cylinder';

const ML_PER_M3 = 1e6;

describe('tube internal volume', () => {
  it('matches the per-metre volumes of common metric tubes', () => {
    // Derived in shared reference sheet §5.1 from V/L = π·ID²/4 (ml/m = 0.785 398 × ID² in mm).
    expect(tubeVolume(1, 0.004) * ML_PER_M3).toBeCloseTo(12.566, 3); // 6/4 tube
    expect(tubeVolume(1, 0.006) * ML_PER_M3).toBeCloseTo(28.274, 3); // 8/6 tube
    expect(tubeVolume(1, 0.0025) * ML_PER_M3).toBeCloseTo(4.909, 3); // 4/2.5 tube
    expect(tubeVolume(1, 0.01) * ML_PER_M3).toBeCloseTo(78.54, 2); // 12/10 tube
  });

  it('shows the tubing can outweigh a small cylinder', () => {
    // Derived in shared reference sheet §5.1: 2 m of 6/4 tube ≈ 25 ml; a 16 mm bore × 10 mm stroke sweeps ≈ 2.0 ml.
    expect(tubeVolume(2, 0.004) * ML_PER_M3).toBeCloseTo(25.13, 2);
    expect(pistonArea(0.016) * 0.01 * ML_PER_M3).toBeCloseTo(2.01, 2);
  });

  it('scales linearly with length and rejects negative sizes', () => {
    expect(tubeVolume(3.5, 0.004)).toBeCloseTo(3.5 * tubeVolume(1, 0.004), 15);
    expect(tubeVolume(0, 0.004)).toBe(0);
    expect(() => tubeVolume(-1, 0.004)).toThrow(RangeError);
    expect(() => tubeVolume(1, -0.004)).toThrow(RangeError);
  });
});
