import { describe, expect, it } from 'vitest';
import type { InputEvent } from '@/engine/solver/simulate';
import { signal, type Trace } from '@/engine/trace/trace';
import { TestCircuit } from '../support/circuit';
import { AMBIENT_PA, cylinderRig, lamp, meterOut, pressFor, runCircuit, valueAt } from './harness';

/** Fine sampling, so that positions read at an edge are within 0.2 mm of where it happened. */
const INTERVAL_S = 0.0002;
const run = (circuit: TestCircuit, inputs: InputEvent[], untilS: number): Trace => runCircuit(circuit.build(), inputs, untilS, INTERVAL_S);

/** Piston positions at the changes of a signal, in order. */
function positionsAtEdges(trace: Trace, name: string, piston: string): number[] {
  const s = signal(trace, name)!.values;
  const x = signal(trace, piston)!.values;
  return s.flatMap((v, k) => (k > 0 && v !== s[k - 1] ? [x[k]!] : []));
}

/** A cylinder of 100 mm stroke (meter-out on its rod side), and the control supply. */
function stroke(): TestCircuit {
  return cylinderRig({ cylinder: { bore: 0.032, rod: 0.012, stroke: 0.1 }, lineB: meterOut('fc', 0.2) }).add('ps', 'dc-supply');
}
/** Out at 0.1 s, back at 1.5 s. */
const cycle = pressFor('v', 0.1, 1.4);

describe('position and pressure switches', () => {
  it('a limit switch at 60 mm changes over within its 2 mm window, releasing 0.5 mm further out (hysteresis)', () => {
    const circuit = stroke()
      .add('LS', 'limit-switch')
      .link('cyl', 'LS', 0.06)
      .wire('ps:L+', 'LS:11');
    const trace = run(lamp(lamp(circuit, 'H1', 'LS:14'), 'H2', 'LS:12'), cycle, 3);
    expect(signal(trace, 'H2:lit')!.values[0]).toBe(1);
    // Outwards: actuated 2 mm before the set position, released 2.5 mm past it; inwards the same, mirrored.
    const edges = positionsAtEdges(trace, 'H1:lit', 'cyl:x');
    expect(edges).toHaveLength(4);
    [0.058, 0.0625, 0.062, 0.0575].forEach((x, i) => expect(edges[i]).toBeCloseTo(x, 3));
    expect(positionsAtEdges(trace, 'H2:lit', 'cyl:x')).toHaveLength(4);
  });

  it('an inductive sensor detects within its narrower window (±1.5 mm) and a reed sensor within ±4 mm', () => {
    const circuit = stroke()
      .add('B1', 'proximity-sensor-inductive')
      .add('B2', 'proximity-sensor-reed')
      .link('cyl', 'B1', 0.05)
      .link('cyl', 'B2', 0.05)
      .wire('ps:L+', 'B1:BN')
      .wire('ps:L+', 'B2:BN')
      .wire('B1:BU', 'ps:M')
      .wire('B2:BU', 'ps:M');
    const trace = run(lamp(lamp(circuit, 'H1', 'B1:BK'), 'H2', 'B2:BK'), cycle, 3);
    const inductive = positionsAtEdges(trace, 'H1:lit', 'cyl:x');
    const reed = positionsAtEdges(trace, 'H2:lit', 'cyl:x');
    // Outwards: on at the window's near edge, off at its far edge plus the hysteresis.
    expect(inductive[0]).toBeCloseTo(0.0485, 3);
    expect(inductive[1]).toBeCloseTo(0.0518, 3);
    expect(reed[0]).toBeCloseTo(0.046, 3);
    expect(reed[1]).toBeCloseTo(0.0555, 3);
    expect(inductive).toHaveLength(4);
    expect(reed).toHaveLength(4);
  });

  it('a pressure switch operates above 4 bar gauge on the cap side and releases below 3.5 bar', () => {
    const circuit = stroke()
      .add('PS', 'pressure-switch', { setPressure: 400_000, hysteresis: 50_000 })
      .tube('PS:1', 'cyl:A', 0.05)
      .wire('ps:L+', 'PS:11');
    const trace = run(lamp(circuit, 'H1', 'PS:14'), cycle, 3);
    const p = signal(trace, 'cyl:p:A')!.values;
    const lit = signal(trace, 'H1:lit')!.values;
    const on = lit.findIndex((v) => v === 1);
    const off = lit.findIndex((v, k) => k > on && v === 0);
    expect(p[on]! - AMBIENT_PA).toBeGreaterThanOrEqual(399_000);
    expect(p[on - 1]! - AMBIENT_PA).toBeLessThan(401_000);
    expect(p[off]! - AMBIENT_PA).toBeLessThanOrEqual(351_000);
    expect(p[off - 1]! - AMBIENT_PA).toBeGreaterThan(349_000);
  });

  it('a diode lets one button light both lamps while the other lights only its own', () => {
    const circuit = new TestCircuit()
      .add('ps', 'dc-supply')
      .add('S1', 'pushbutton-no')
      .add('S2', 'pushbutton-no')
      .add('D1', 'diode')
      .wire('ps:L+', 'S1:13')
      .wire('ps:L+', 'S2:13')
      .wire('S1:14', 'D1:A')
      .wire('S2:14', 'D1:K');
    const trace = run(lamp(lamp(circuit, 'H1', 'S1:14'), 'H2', 'D1:K'), [{ t: 0.1, component: 'S1', action: 'press' }, { t: 0.2, component: 'S1', action: 'release' }, { t: 0.3, component: 'S2', action: 'press' }], 0.4);
    const at = (name: string, t: number) => valueAt(trace, name, t);
    expect([at('H1:lit', 0.15), at('H2:lit', 0.15)]).toEqual([1, 1]);
    expect([at('H1:lit', 0.35), at('H2:lit', 0.35)]).toEqual([0, 1]);
  });
});
