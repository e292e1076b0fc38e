import { describe, expect, it } from 'vitest';
import { TestCircuit } from '@/tests/engine/support/circuit';
import { run } from './helpers';

/**
 * The engine promises bit-for-bit repeatable traces for the same document, inputs and options
 * (no randomness, no clock reads, fixed iteration order), and traces that depend on the inputs.
 */

function circuit() {
  return new TestCircuit()
    .add('src', 'air-supply', { pressure: 600_000 })
    .add('v', 'valve-5-2', {})
    .add('fc', 'throttle', { opening: 0.5 })
    .add('cyl', 'cylinder-double-acting', { load: 80 })
    .tube('src:2', 'v:1')
    .tube('v:4', 'cyl:A')
    .tube('v:2', 'fc:1')
    .tube('fc:2', 'cyl:B')
    .build();
}

const options = { untilS: 1.5, intervalS: 0.002 };
const pressAt = (t: number) => [
  { t, component: 'v', action: 'press' as const },
  { t: t + 0.6, component: 'v', action: 'release' as const },
];

describe('determinism', () => {
  it('gives identical traces for the same document and inputs', () => {
    const a = run(circuit(), pressAt(0.1), options);
    const b = run(circuit(), pressAt(0.1), options);
    expect(a.events.length).toBeGreaterThan(3);
    expect(b).toEqual(a);
    expect(JSON.stringify(b)).toBe(JSON.stringify(a));
  });

  it('gives a different trace when an input comes at another time', () => {
    const a = run(circuit(), pressAt(0.1), options);
    const c = run(circuit(), pressAt(0.12), options);
    expect(JSON.stringify(c)).not.toBe(JSON.stringify(a));
    const switched = (trace: typeof a) => trace.events.find((e) => e.componentId === 'v' && e.kind === 'switched')?.t;
    expect(switched(c)! - switched(a)!).toBeCloseTo(0.02, 9);
  });
});
