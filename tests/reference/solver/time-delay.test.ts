import { describe, expect, it } from 'vitest';
import { STANDARD_ATMOSPHERE_PA } from '@/engine/calc/constants';
import { fillTimeClosedForm } from '@/engine/calc/gas';
import { TestCircuit } from '@/tests/engine/support/circuit';
import { eventTime, relDiff, run } from './helpers';

/**
 * The pneumatic timer as an "RC" element: the delay of the normally closed time-delay valve is the time its
 * reservoir takes to fill through its throttle from ambient to ambient + pilot switching pressure, with
 * supply pressure on control port 12, plus the spool's switching time.
 *
 * Reference: the closed-form fill time of the shared reference sheet §3.2 (ISO 6358-1 flow into a rigid
 * isothermal volume, n = 1, matching the engine's isothermal nodes).
 * - The timer reservoir is an internal node of exactly the reservoir volume (no port bore is added to it).
 * - Port 12 sits on the supply's port node, held at the set pressure (an earlier engine revision fed it
 *   through a C = 1e-6 m³/(s·Pa) passage, a couple of pascals low against the C = 2e-10 throttle): negligible.
 * - The spool moves `switchTime` after the pilot threshold is crossed, and the 'switched' event marks that;
 *   it is added to the closed form. Left out, it alone would be a 2 % error at the defaults.
 */

const SUPPLY_GAUGE = 600_000;
const SUPPLY_PA = STANDARD_ATMOSPHERE_PA + SUPPLY_GAUGE;

interface Setting {
  reservoirVolume: number;
  throttleConductance: number;
  pilotThreshold: number;
  switchTime: number;
}

const settings: Setting[] = [
  // Defaults of the component: 50 cm³, C = 0.02 dm³/(s·bar), 2 bar pilot, 15 ms.
  { reservoirVolume: 5e-5, throttleConductance: 2e-10, pilotThreshold: 200_000, switchTime: 0.015 },
  // A higher pilot pressure (4.5 bar gauge) takes the fill past b·p_s into the subsonic part.
  { reservoirVolume: 2e-5, throttleConductance: 1e-10, pilotThreshold: 450_000, switchTime: 0.01 },
];

describe('time-delay valve (NC) delay vs the closed-form reservoir fill time (reference sheet §3.2)', () => {
  for (const s of settings) {
    it(`V = ${s.reservoirVolume * 1e6} cm³, C = ${s.throttleConductance}, pilot ${s.pilotThreshold / 1e5} bar`, () => {
      const document = new TestCircuit()
        .add('src', 'air-supply', { pressure: SUPPLY_GAUGE })
        .add('tdv', 'time-delay-valve-nc', { ...s })
        .tube('src:2', 'tdv:12', 0.1, 0.004)
        .tube('src:2', 'tdv:1', 0.1, 0.004)
        .build();
      const closed =
        fillTimeClosedForm({
          volumeM3: s.reservoirVolume,
          supplyPa: SUPPLY_PA,
          startPa: STANDARD_ATMOSPHERE_PA,
          endPa: STANDARD_ATMOSPHERE_PA + s.pilotThreshold,
          C: s.throttleConductance,
          b: 0.5,
          n: 1,
        }) + s.switchTime;
      const trace = run(document, [], { untilS: closed * 1.5, intervalS: 0.001 });
      // Control air is on port 12 from t = 0 (held there, or filled within microseconds by the older feed).
      const delay = eventTime(trace, 'tdv', 'switched', 'open');
      // The brief allows 5 %; with the switching time accounted for nothing else is left, so 1 % is asked.
      expect(relDiff(delay, closed)).toBeLessThan(0.01);
    });
  }
});
