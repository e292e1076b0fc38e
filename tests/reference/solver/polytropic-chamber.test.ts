import { describe, expect, it } from 'vitest';
import { R_AIR_J_PER_KG_K } from '@/engine/calc/constants';
import { PORT_VOLUME_M3 } from '@/engine/solver/compile';
import { compile } from '@/engine/solver/compile';
import { simulate } from '@/engine/solver/simulate';
import { signal } from '@/engine/trace/trace';
import { TestCircuit } from '../../engine/support/circuit';

// A double-acting cylinder with both ports plugged, pushed in by a load: each side is a closed
// mass of air, so the rest position follows from the polytropic law p·V^n = const (textbook
// thermodynamics, shared reference sheet §3) and the static force balance p_A·A − p_B·(A − a)
// − p_amb·a = F (§4.1). The prediction below is solved independently of the engine by bisection.
const AMBIENT = 101_325;
const T = 293.15;
const RT = R_AIR_J_PER_KG_K * T;
const BORE = 0.032;
const ROD = 0.012;
const STROKE = 0.1;
const START = 0.05;
const DEAD = 3e-6;
const LOAD = 300;

const A = (Math.PI * BORE * BORE) / 4;
const ANNULUS = A - (Math.PI * ROD * ROD) / 4;

function bisect(f: (x: number) => number, lo: number, hi: number): number {
  let a = lo;
  let b = hi;
  for (let i = 0; i < 200; i += 1) {
    const mid = (a + b) / 2;
    if (Math.sign(f(mid)) === Math.sign(f(a))) a = mid;
    else b = mid;
  }
  return (a + b) / 2;
}

/** Pressure of a closed side (plugged port node, isothermal, plus polytropic chamber) at chamber volume v. */
function sidePressure(v: number, v0: number, n: number): number {
  const massTotal = (AMBIENT * (PORT_VOLUME_M3 + v0)) / RT;
  const mass = (p: number) => (p * PORT_VOLUME_M3) / RT + ((v * AMBIENT) / RT) * Math.pow(p / AMBIENT, 1 / n);
  return bisect((p) => mass(p) - massTotal, 1e3, 1e8);
}

function predictedRest(n: number): number {
  const capV = (x: number) => DEAD + A * x;
  const rodV = (x: number) => DEAD + ANNULUS * (STROKE - x);
  const force = (x: number) =>
    sidePressure(capV(x), capV(START), n) * A - sidePressure(rodV(x), rodV(START), n) * ANNULUS - AMBIENT * (A - ANNULUS) - LOAD;
  return bisect(force, 0.001, STROKE - 0.001);
}

function engineRest(n: number): number {
  const doc = new TestCircuit()
    .add('cyl', 'cylinder-double-acting', {
      bore: BORE,
      rod: ROD,
      stroke: STROKE,
      startPosition: START,
      load: LOAD,
      coulombFriction: 0,
      breakawayFriction: 0,
      viscousFriction: 3000,
      movingMass: 1,
      deadVolumeCap: DEAD,
      deadVolumeRod: DEAD,
      polytropicExponent: n,
    })
    .build();
  const { model, diagnostics } = compile(doc);
  if (!model) throw new Error(diagnostics.map((d) => d.message).join('; '));
  const trace = simulate(model, [], { untilS: 3, intervalS: 0.01 });
  return signal(trace, 'cyl:x')!.values.at(-1)!;
}

describe('polytropic chamber air', () => {
  it.each([1, 1.2, 1.4])('rests where p·V^n = const and the forces balance (n = %s)', (n) => {
    expect(Math.abs(engineRest(n) - predictedRest(n))).toBeLessThan(0.0002);
  });

  it('is stiffer when adiabatic than when isothermal', () => {
    const isothermal = predictedRest(1);
    const adiabatic = predictedRest(1.4);
    // The load pushes the piston in less far against the stiffer (adiabatic) air cushion.
    expect(START - adiabatic).toBeLessThan(START - isothermal);
    expect(Math.abs(engineRest(1.4) - engineRest(1))).toBeGreaterThan(0.001);
  });
});
