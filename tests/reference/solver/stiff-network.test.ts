import { describe, expect, it } from 'vitest';
import { STANDARD_ATMOSPHERE_PA } from '@/engine/calc/constants';
import { TestCircuit } from '@/tests/engine/support/circuit';
import { run } from './helpers';

/**
 * A stiff network: a large valve (C = 5 dm³/(s·bar)) joined to a cylinder by 1 cm of 4 mm bore tube.
 * The tube node holds ≈ 0.33 cm³, so its pressure time constant near equilibrium is about a microsecond
 * against a stroke of a few hundred milliseconds: an explicit integrator would crawl. The engine's
 * L-stable Rosenbrock method (Verwer et al. 1999, ROS2) should take a bounded number of steps and keep every
 * pressure physical: above 0 and, with no source above the supply, not above the supply pressure
 * (conservation of mass and energy bound the isothermal lumped model; 1 % margin for the error control).
 */

const SUPPLY_PA = STANDARD_ATMOSPHERE_PA + 600_000;

function stiffCircuit() {
  return new TestCircuit()
    .add('src', 'air-supply', { pressure: 600_000 })
    .add('v', 'valve-5-2', { conductance: 5e-8 })
    .add('cyl', 'cylinder-double-acting', { load: 50 })
    .tube('src:2', 'v:1', 0.01, 0.004)
    .tube('v:4', 'cyl:A', 0.01, 0.004)
    .tube('v:2', 'cyl:B', 0.01, 0.004)
    .build();
}

describe('stiff network: 1 cm tube between a C = 5e-8 valve and a cylinder', () => {
  const trace = run(
    stiffCircuit(),
    [
      { t: 0.1, component: 'v', action: 'press' },
      { t: 1.0, component: 'v', action: 'release' },
    ],
    { untilS: 2, intervalS: 0.001 },
  );

  it('finishes both strokes', () => {
    expect(trace.time.at(-1)).toBeCloseTo(2, 12);
    const ends = trace.events.filter((e) => e.componentId === 'cyl' && e.kind === 'end-position').map((e) => e.detail);
    expect(ends).toEqual(['extended', 'retracted']);
  });

  it('takes a bounded number of steps', () => {
    expect(trace.stats.steps).toBeLessThan(20_000);
    expect(trace.stats.rejectedSteps).toBeLessThan(trace.stats.steps);
  });

  it('keeps every pressure between 0 and the supply pressure + 1 %', () => {
    for (const s of trace.signals.filter((x) => x.unit === 'Pa')) {
      expect(Math.min(...s.values)).toBeGreaterThan(0);
      expect(Math.max(...s.values)).toBeLessThanOrEqual(SUPPLY_PA * 1.01);
    }
  });
});
