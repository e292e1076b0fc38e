import { describe, expect, it } from 'vitest';
import { rangeOver } from '../components/harness';
import { clampRig, runWith, UNTIL_S } from './rigs';

describe('sensor failed', () => {
  const doc = clampRig().build();

  it('never switches its output, while the healthy sensor lights the lamp as the piston passes', () => {
    expect(rangeOver(runWith(doc), 'H1:lit', 0, UNTIL_S).max).toBe(1);
    const failed = runWith(doc, { faultId: 'sensor-failed', tag: 'B1', severity: 1 });
    expect(rangeOver(failed, 'H1:lit', 0, UNTIL_S).max).toBe(0);
    // The piston itself strokes as before.
    expect(rangeOver(failed, 'cyl:x', 0, UNTIL_S).max).toBeGreaterThan(0.09);
  });

  it("the sensor's stuckAt parameter can also hold the output on from the start", () => {
    const withOn = { ...doc, components: doc.components.map((c) => (c.tag === 'B1' ? { ...c, parameters: { ...c.parameters, stuckAt: 'on' } } : c)) };
    expect(rangeOver(runWith(withOn), 'H1:lit', 0, UNTIL_S).min).toBe(1);
  });
});
