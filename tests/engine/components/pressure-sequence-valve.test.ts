import { describe, expect, it } from 'vitest';
import { bar, crossingTime, eventTime, eventsOf, portBar, runCircuit, withSupply, AMBIENT_PA } from './harness';

const PRESS = 0.1;

/**
 * Control port 12 of sequence valve `sq` fills slowly (pushbutton `pb`, throttle `th`,
 * 0.1 L reservoir), so its pressure crosses the setting at a well defined time.
 * Switching time 0, so the switch should coincide with the crossing.
 */
function run(settingBar: number) {
  const doc = withSupply(6)
    .add('pb', 'valve-3-2-nc')
    .add('th', 'throttle', { opening: 0.1 })
    .add('res', 'reservoir', { volume: 1e-4 })
    .add('sq', 'pressure-sequence-valve', { pilotThreshold: bar(settingBar), switchTime: 0 })
    .add('g', 'pressure-gauge')
    .tube('sup:2', 'pb:1')
    .tube('pb:2', 'th:1')
    .tube('th:2', 'sq:12')
    .tube('sq:12', 'res:1')
    .tube('sup:2', 'sq:1')
    .tube('sq:2', 'g:1')
    .build();
  return runCircuit(doc, [{ t: PRESS, component: 'pb', action: 'press' }], 3);
}

describe('pressure-sequence-valve', () => {
  for (const setting of [3, 4.5]) {
    it(`switches when the control pressure reaches its ${setting} bar setting`, () => {
      const trace = run(setting);
      const crossing = crossingTime(trace, 'sq:p:12', AMBIENT_PA + bar(setting), 'rising', PRESS);
      expect(crossing).toBeDefined();
      const switched = eventTime(trace, 'sq', 'switched', 0, 'open');
      expect(Math.abs(switched - crossing!)).toBeLessThan(0.005);
      // Output exhausted before, at supply pressure after.
      expect(portBar(trace, 'sq', '2', switched - 0.02)).toBeLessThan(0.05);
      expect(Math.abs(portBar(trace, 'sq', '2', Math.min(switched + 0.3, 2.95)) - 6)).toBeLessThan(0.05);
      expect(eventsOf(trace, 'sq', 'switched')).toHaveLength(1);
    });
  }

  it('a higher setting switches later', () => {
    const low = eventTime(run(3), 'sq', 'switched', 0, 'open');
    const high = eventTime(run(4.5), 'sq', 'switched', 0, 'open');
    expect(high).toBeGreaterThan(low + 0.05);
  });
});
