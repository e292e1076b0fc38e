import { describe, expect, it } from 'vitest';
import { eventTime, eventsOf, expectValveSteps, rangeOver, runCircuit, strokeTime, valueAt, withSupply } from './harness';

describe('valve-5-3-closed', () => {
  it('blocks every port in the centre, holding whatever the lines had; side a feeds 4, side b feeds 2', () => {
    expectValveSteps('valve-5-3-closed', {}, ['2', '4'], [
      { actions: [], position: 1, ports: { '2': 'ambient', '4': 'ambient' } },
      { actions: [{ action: 'press' }], position: 0, ports: { '2': 'ambient', '4': 'supply' } },
      { actions: [{ action: 'press', parameter: 'b' }], position: 2, ports: { '2': 'supply', '4': 'ambient' } },
      // Back to centre: 2 keeps its air and 4 stays empty …
      { actions: [{ action: 'toggle', parameter: 'b' }], position: 1, ports: { '2': 'supply', '4': 'ambient' } },
      // … also when the supply is lost, since port 1 is blocked too.
      { actions: [{ component: 'sup', action: 'set', value: 0 }], position: 1, ports: { '2': 'supply', '4': 'ambient' } },
    ]);
  });

  it('keeps a detented lever where it was put: a release does not centre it', () => {
    expectValveSteps('valve-5-3-closed', {}, ['2', '4'], [
      { actions: [{ action: 'press' }], position: 0, ports: { '2': 'ambient', '4': 'supply' } },
      { actions: [{ action: 'release' }], position: 0, ports: { '2': 'ambient', '4': 'supply' } },
    ]);
  });

  describe('holding a cylinder mid-stroke', () => {
    const doc = () =>
      withSupply(6).add('v', 'valve-5-3-closed').add('cyl', 'cylinder-double-acting').tube('sup:2', 'v:1').tube('v:4', 'cyl:A').tube('v:2', 'cyl:B').build();
    // Side b first fills the rod end (the piston is already retracted), so the extension runs against back pressure.
    const fillRodEnd = { t: 0.05, component: 'v', action: 'press', parameter: 'b' } as const;
    const START = 0.4;

    it('stops the piston between the ends when the lever is returned to centre, and it stays there', () => {
      // A first run to learn the stroke time, then stop at about 40 % of it.
      const full = runCircuit(doc(), [fillRodEnd, { t: START, component: 'v', action: 'press' }], 1);
      const stroke = strokeTime(full, 'cyl', 'extended', START);
      const centreAt = START + 0.015 + 0.4 * stroke;

      const trace = runCircuit(
        doc(),
        [fillRodEnd, { t: START, component: 'v', action: 'press' }, { t: centreAt, component: 'v', action: 'toggle' }],
        2,
      );
      expect(eventTime(trace, 'v', 'switched', centreAt, 'centre')).toBeLessThan(centreAt + 0.03);
      expect(eventsOf(trace, 'cyl', 'end-position', 'extended')).toEqual([]);
      const x = valueAt(trace, 'cyl:x', 1.99);
      expect(x).toBeGreaterThan(0.005);
      expect(x).toBeLessThan(0.095);
      // Settled: no drift over the last second.
      const late = rangeOver(trace, 'cyl:x', 1.0, 2.0);
      expect(late.max - late.min).toBeLessThan(0.001);
    });
  });
});
