import { describe, expect, it } from 'vitest';
import { eventTime, rangeOver, runCircuit } from '../components/harness';
import { applyFault } from '@/engine/faults';
import { CYCLE, clampRig, PRESS_S, UNTIL_S } from './rigs';

/** Fine sampling, for the speeds read off the trace. */
const INTERVAL_S = 0.0005;
const SENSOR_AT_M = 0.05;

describe('sensor moved along the stroke', () => {
  const doc = clampRig(0.3, SENSOR_AT_M).build();
  const run = (shiftM: number) => runCircuit(applyFault(doc, { faultId: 'sensor-shifted', tag: 'B1', severity: shiftM }), CYCLE, UNTIL_S, INTERVAL_S);
  const onAt = (shiftM: number) => eventTime(run(shiftM), 'B1', 'actuated', PRESS_S);

  for (const shiftM of [0.01, -0.01]) {
    it(`switches ${shiftM > 0 ? 'later' : 'earlier'} by the shift over the speed (${shiftM * 1000} mm)`, () => {
      const healthy = run(0);
      const from = onAt(0);
      const to = onAt(shiftM);
      // Travel time over the shift lies between shift/v_max and shift/v_min on the stretch between the two switch points.
      const [a, b] = shiftM > 0 ? [from, to] : [to, from];
      const speed = rangeOver(healthy, 'cyl:v', a, b);
      expect(speed.min).toBeGreaterThan(0);
      const dt = to - from;
      const tolerance = 2 * INTERVAL_S;
      expect(Math.abs(dt)).toBeGreaterThanOrEqual(Math.abs(shiftM) / speed.max - tolerance);
      expect(Math.abs(dt)).toBeLessThanOrEqual(Math.abs(shiftM) / speed.min + tolerance);
      expect(Math.sign(dt)).toBe(Math.sign(shiftM));
    });
  }

  it('moves only the links to that sensor, and keeps them on the stroke', () => {
    const moved = applyFault(doc, { faultId: 'sensor-shifted', tag: 'B1', severity: -0.02 });
    expect(moved.links.find((l) => l.to === 'B1')!.positionM).toBeCloseTo(SENSOR_AT_M - 0.02, 12);
    const pushedOff = applyFault(clampRig(0.3, 0.01).build(), { faultId: 'sensor-shifted', tag: 'B1', severity: -0.02 });
    expect(pushedOff.links.find((l) => l.to === 'B1')!.positionM).toBe(0);
  });
});
