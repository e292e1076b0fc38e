import { describe, expect, it } from 'vitest';
import { pressFor, rangeOver, runCircuit, strokeTime } from '../components/harness';
import { applyFault } from '@/engine/faults';
import { springRig } from './rigs';

describe('return spring weakened', () => {
  const run = (fraction: number) => runCircuit(applyFault(springRig().build(), { faultId: 'spring-weakened', tag: 'cyl', severity: fraction }), pressFor('v', 0.1, 0.9), 4);

  it('returns the single-acting cylinder slower as the spring weakens', () => {
    // Down to 0.8: below 0.75 the preload (20 N) no longer beats the 15 N sliding friction near the end.
    const times = [1, 0.9, 0.8].map((fraction) => strokeTime(run(fraction), 'cyl', 'retracted', 1));
    expect(times[1]!).toBeGreaterThan(times[0]! * 1.1);
    expect(times[2]!).toBeGreaterThan(times[1]! * 1.1);
  });

  it('leaves the piston out once the spring force at full stroke is below the breakaway friction', () => {
    // 50 mm stroke: 0.5 × (20 N + 400 N/m × 0.05 m) = 20 N, below the 25 N breakaway.
    expect(rangeOver(run(0.5), 'cyl:x', 1, 4).min).toBeCloseTo(0.05, 6);
  });

  it('scales preload and rate from what the drawing sets', () => {
    const doc = applyFault(springRig().build(), { faultId: 'spring-weakened', tag: 'cyl', severity: 0.5 });
    expect(doc.components.find((c) => c.tag === 'cyl')!.parameters).toMatchObject({ springPreload: 10, springRate: 200 });
  });
});
