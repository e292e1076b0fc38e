import { describe, expect, it } from 'vitest';
import { bar, eventsOf, portBar, runCircuit, withSupply } from './harness';

const BAND_BAR = 0.3;

/** 6 bar supply → regulator `reg` (set 4 bar, band 0.3 bar) → dead-end outlet line with a 0.1 L reservoir: no flow once filled. */
const doc = (relieving: boolean) =>
  withSupply(6)
    .add('reg', 'pressure-regulator', { setPressure: bar(4), band: bar(BAND_BAR), relieving })
    .add('res', 'reservoir', { volume: 1e-4 })
    .tube('sup:2', 'reg:1')
    .tube('reg:2', 'res:1')
    .build();

describe('pressure-regulator', () => {
  it('settles its outlet near the set pressure, within the proportional band, with no flow', () => {
    const trace = runCircuit(doc(true), [], 1.5);
    const out = portBar(trace, 'reg', '2', 1.45);
    expect(Math.abs(out - 4)).toBeLessThanOrEqual(BAND_BAR);
    // Settled: it no longer moves.
    expect(Math.abs(out - portBar(trace, 'reg', '2', 1.25))).toBeLessThan(0.02);
  });

  it('when relieving, vents the outlet back down after the set pressure is lowered', () => {
    const trace = runCircuit(doc(true), [{ t: 1, component: 'reg', action: 'set', value: bar(2) }], 3);
    expect(Math.abs(portBar(trace, 'reg', '2', 0.95) - 4)).toBeLessThanOrEqual(BAND_BAR);
    expect(Math.abs(portBar(trace, 'reg', '2', 2.95) - 2)).toBeLessThanOrEqual(BAND_BAR);
    expect(eventsOf(trace, 'reg', 'set-pressure-changed')).toHaveLength(1);
  });

  it('when not relieving, keeps the trapped outlet pressure after the set pressure is lowered', () => {
    const trace = runCircuit(doc(false), [{ t: 1, component: 'reg', action: 'set', value: bar(2) }], 3);
    const before = portBar(trace, 'reg', '2', 0.95);
    expect(Math.abs(portBar(trace, 'reg', '2', 2.95) - before)).toBeLessThan(0.02);
  });

  it('raises the outlet again when the set pressure is raised', () => {
    const trace = runCircuit(doc(true), [{ t: 1, component: 'reg', action: 'set', value: bar(5) }], 2.5);
    expect(Math.abs(portBar(trace, 'reg', '2', 2.45) - 5)).toBeLessThanOrEqual(BAND_BAR);
  });
});
