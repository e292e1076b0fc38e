import { describe, expect, it } from 'vitest';
import { STANDARD_ATMOSPHERE_PA } from '@/engine/calc/constants';
import { tubeVolume } from '@/engine/calc/tube';
import { PORT_VOLUME_M3 } from '@/engine/solver/compile';
import type { Trace } from '@/engine/trace/trace';
import { TestCircuit } from '@/tests/engine/support/circuit';
import { run, values } from './helpers';

/**
 * The air budget of a cycling cylinder closes.
 *
 * 1. The engine's own bookkeeping: trace.stats.massBalanceErrorKg is round-off.
 * 2. An independent budget from the trace alone (conservation of mass, nothing else), over the control
 *    volume downstream of the valve's supply port 1 (the ideal supply holds port 1 at p_s, so its own air is
 *    the supply's, not the circuit's):
 *      ∫ (q_1→4 + q_1→2) dt − ∫ (q_2→3 + q_4→5) dt = Δm of the circuit,
 *    with the sampled flows integrated by the trapezoidal rule and Δm from the ideal gas law m = p·V/(R·T)
 *    (reference sheet §3) per node. The run ends at rest, where no passage carries flow, so each cylinder
 *    chamber is at the pressure of its port (whose signal the trace has) and its volume follows from the
 *    piston position (reference sheet §3.1: V_dead + A·x, V_dead + (A − a)·(s − x)).
 *    The residual of this budget is the difference between the integrator's own quadrature and the
 *    trapezoidal rule over the samples (openings jump between two samples and the small port nodes fill
 *    within a few samples). It measures about 10⁻⁷ of the supplied air, and moves up and down at that level
 *    when the interval changes, so the check asks for under 10 ppm at 0.1 ms and at 0.05 ms: a leak of
 *    10 ppm of the air supplied would fail it.
 *    Steps are limited to the output interval here: between samples the trace interpolates linearly, and
 *    across a longer step that straight line, not the integrator's own quadrature, would set the residual.
 */

const R = 287.05;
const T = 293.15;
const P_AMB = STANDARD_ATMOSPHERE_PA;
const BORE = 0.032;
const ROD = 0.012;
const STROKE = 0.1;
const DEAD = 3e-6;
const TUBE_L = 0.5;
const TUBE_D = 0.004;

function cyclingCylinder() {
  return new TestCircuit()
    .add('src', 'air-supply', { pressure: 600_000 })
    .add('v', 'valve-5-2', {})
    .add('cyl', 'cylinder-double-acting', { bore: BORE, rod: ROD, stroke: STROKE, load: 100, deadVolumeCap: DEAD, deadVolumeRod: DEAD })
    .tube('src:2', 'v:1', TUBE_L, TUBE_D)
    .tube('v:4', 'cyl:A', TUBE_L, TUBE_D)
    .tube('v:2', 'cyl:B', TUBE_L, TUBE_D)
    .build();
}

const inputs = [
  { t: 0.2, component: 'v', action: 'press' as const },
  { t: 0.8, component: 'v', action: 'release' as const },
  { t: 1.4, component: 'v', action: 'press' as const },
];
const UNTIL_S = 2.2;

function integrate(time: readonly number[], q: readonly number[]): number {
  let sum = 0;
  for (let i = 1; i < time.length; i += 1) sum += 0.5 * (q[i]! + q[i - 1]!) * (time[i]! - time[i - 1]!);
  return sum;
}

/** (supplied − exhausted − gained)/supplied, and the supplied mass, from a trace. */
function budget(trace: Trace): { residual: number; supplied: number } {
  const t = trace.time;
  // Passages 1→4 and 1→2 of the 5/2 valve are signed from supply port 1 to the working port.
  const supplied = integrate(t, values(trace, 'v:q:1-4')) + integrate(t, values(trace, 'v:q:1-2'));
  // Passages 2→3 and 4→5 of the 5/2 valve are signed from the working port to the open exhaust.
  const exhausted = integrate(t, values(trace, 'v:q:2-3')) + integrate(t, values(trace, 'v:q:4-5'));

  // The run ends at rest, so chamber pressure = port pressure. In the linearised band of the cylinder port
  // (C = 2e-8, b = 0.3: ≈ 1.3e-6 kg/(s·Pa)) a flow below 1e-6 kg/s means less than 1 Pa between them,
  // i.e. < 1e-9 kg in a chamber: 4e-7 of this budget. (Whether a resting circuit may record flow at all is
  // the subject of the separate idle test below.)
  const last = t.length - 1;
  for (const s of trace.signals) if (s.unit === 'kg/s') expect(Math.abs(s.values[last]!)).toBeLessThan(1e-6);

  const end = (name: string) => values(trace, name)[last]!;
  const x = end('cyl:x');
  const capArea = (Math.PI * BORE * BORE) / 4;
  const annulus = capArea - (Math.PI * ROD * ROD) / 4;
  const portNode = 2 * PORT_VOLUME_M3 + tubeVolume(TUBE_L, TUBE_D);
  // [pressure at the end, volume at the end, volume at the start]; every node starts at ambient with x = 0.
  // The valve's unconnected pilot ports 12 and 14 are nodes too, but no passage touches them.
  // The supply port node (supply port 2 + valve port 1 + tube) lies outside the control volume.
  const nodes: Array<[number, number, number]> = [
    [end('cyl:p:A'), portNode, portNode], // valve port 4 + cylinder port A + tube
    [end('cyl:p:B'), portNode, portNode], // valve port 2 + cylinder port B + tube
    [end('cyl:p:A'), DEAD + capArea * x, DEAD], // cap chamber
    [end('cyl:p:B'), DEAD + annulus * (STROKE - x), DEAD + annulus * STROKE], // rod chamber
  ];
  const gained = nodes.reduce((sum, [p, v, v0]) => sum + (p * v - P_AMB * v0) / (R * T), 0);
  return { residual: (supplied - exhausted - gained) / supplied, supplied };
}

describe('air budget of a cycling cylinder', () => {
  const trace = run(cyclingCylinder(), inputs, { untilS: UNTIL_S, intervalS: 1e-4, maxStepS: 1e-4 });

  it('extends, retracts and extends again (the budget is exercised)', () => {
    const ends = trace.events.filter((e) => e.componentId === 'cyl' && e.kind === 'end-position').map((e) => e.detail);
    expect(ends).toEqual(['extended', 'retracted', 'extended']);
  });

  it("keeps the engine's own mass balance error at round-off", () => {
    expect(Math.abs(trace.stats.massBalanceErrorKg)).toBeLessThan(1e-12);
  });

  it('supplied air = air left in the circuit + air exhausted, to 10 ppm at two output intervals', () => {
    const coarse = budget(trace);
    expect(coarse.supplied).toBeGreaterThan(1e-3);
    expect(Math.abs(coarse.residual)).toBeLessThan(1e-5);
    const fine = budget(run(cyclingCylinder(), inputs, { untilS: UNTIL_S, intervalS: 5e-5, maxStepS: 5e-5 }));
    expect(Math.abs(fine.residual)).toBeLessThan(1e-5);
  });
});

describe('a circuit left at rest', () => {
  /**
   * After the last stroke the circuit stands still for 20 s. Conservation of mass for the cap chamber
   * (reference sheet §3.1 with n = 1 and x fixed at the stroke end): the air that the trace says entered
   * through port A, ∫ q_port-A dt, must equal the chamber's mass change (p_end − p_start)·V/(R·T).
   * The bound is the mass of 50 Pa in that chamber (the engine's default absolute pressure tolerance),
   * so a recorded flow that does not move any air cannot hide in it for long.
   */
  it('records no flow that the pressures do not show (cap chamber over 20 s idle)', () => {
    const idleFrom = 2.2;
    const trace = run(cyclingCylinder(), inputs, { untilS: idleFrom + 20, intervalS: 0.01 });
    const t = trace.time;
    const k0 = t.findIndex((x) => x >= idleFrom - 1e-9);
    const last = t.length - 1;
    const q = values(trace, 'cyl:q:port-A');
    const p = values(trace, 'cyl:p:A');
    expect(values(trace, 'cyl:x')[last]).toBeCloseTo(STROKE, 9);
    const volume = DEAD + ((Math.PI * BORE * BORE) / 4) * STROKE;
    const entered = integrate(t.slice(k0), q.slice(k0));
    const gained = ((p[last]! - p[k0]!) * volume) / (R * T);
    const bound = (50 * volume) / (R * T);
    expect(Math.abs(entered - gained)).toBeLessThan(bound);
  });
});
