import { describe, expect, it } from 'vitest';
import { eventTime, eventsOf, expectValveSteps, lazy, portBar, runCircuit, withSupply } from './harness';

describe('valve-3-2-nc', () => {
  it('exhausts 2 at rest, feeds 2 when pressed, and springs back on release', () => {
    expectValveSteps('valve-3-2-nc', {}, ['2'], [
      { actions: [], position: 1, ports: { '2': 'ambient' } },
      { actions: [{ action: 'press' }], position: 0, ports: { '2': 'supply' } },
      { actions: [{ action: 'release' }], position: 1, ports: { '2': 'ambient' } },
    ]);
  });

  it('follows a solenoid coil set to 1 and back to 0', () => {
    expectValveSteps('valve-3-2-nc', { actuation: 'solenoid' }, ['2'], [
      { actions: [], position: 1, ports: { '2': 'ambient' } },
      { actions: [{ action: 'set', value: 1 }], position: 0, ports: { '2': 'supply' } },
      { actions: [{ action: 'set', value: 0 }], position: 1, ports: { '2': 'ambient' } },
    ]);
  });

  describe('as a roller valve at the end of a stroke', () => {
    const STROKE = 0.1;
    // Cylinder `cyl` on a 5/2 pushbutton valve; roller valve `rl` linked at full stroke, its output on a gauge.
    const doc = () =>
      withSupply(6)
        .add('v', 'valve-5-2')
        .add('cyl', 'cylinder-double-acting', { stroke: STROKE })
        .add('rl', 'valve-3-2-nc', { actuation: 'roller' })
        .add('g', 'pressure-gauge')
        .tube('sup:2', 'v:1')
        .tube('v:4', 'cyl:A')
        .tube('v:2', 'cyl:B')
        .tube('sup:2', 'rl:1')
        .tube('rl:2', 'g:1')
        .link('cyl', 'rl', STROKE)
        .build();

    const run = lazy(() =>
      runCircuit(
        doc(),
        [
          { t: 0.2, component: 'v', action: 'press' },
          { t: 1.2, component: 'v', action: 'release' },
        ],
        2,
      ),
    );

    it('switches when the cylinder reaches the end, not before', () => {
      const trace = run();
      const extended = eventTime(trace, 'cyl', 'end-position', 0.2, 'extended');
      const switched = eventTime(trace, 'rl', 'switched', 0, 'open');
      expect(Math.abs(switched - extended)).toBeLessThan(0.02);
      expect(eventsOf(trace, 'rl', 'switched').filter((e) => e.t < extended - 0.02)).toEqual([]);
      expect(portBar(trace, 'rl', '2', extended - 0.03)).toBeLessThan(0.05);
      expect(portBar(trace, 'rl', '2', 1.1)).toBeGreaterThan(5.95);
    });

    it('lets go again when the cylinder retracts', () => {
      const trace = run();
      const leaves = eventTime(trace, 'rl', 'switched', 1.2, 'exhausting');
      const retracted = eventTime(trace, 'cyl', 'end-position', 1.2, 'retracted');
      expect(leaves).toBeLessThan(retracted);
      expect(portBar(trace, 'rl', '2', 1.95)).toBeLessThan(0.05);
    });
  });
});
