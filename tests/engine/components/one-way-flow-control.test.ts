import { describe, expect, it } from 'vitest';
import { cylinderRig, lazy, pressFor, runCircuit, strokeTime, valueAt } from './harness';
import type { TestCircuit } from '../support/circuit';

// Press the 5/2 valve at 0.3 s (extend), release at 1.6 s (retract).
const PRESS = 0.3;
const RELEASE = 1.6;
const inputs = pressFor('v', PRESS, RELEASE - PRESS);

/** One-way flow control `fc` in the rod-end line as meter-out: 1 towards the valve, 2 towards the cylinder. */
const meterOutB = (opening?: number) => (c: TestCircuit, valvePort: string, cylinderPort: string) =>
  c
    .add('fc', 'one-way-flow-control', opening === undefined ? {} : { opening })
    .tube(valvePort, 'fc:1')
    .tube('fc:2', cylinderPort);

const times = (doc: ReturnType<TestCircuit['build']>) => {
  const trace = runCircuit(doc, inputs, 3);
  return { trace, extend: strokeTime(trace, 'cyl', 'extended', PRESS), retract: strokeTime(trace, 'cyl', 'retracted', RELEASE) };
};

describe('one-way-flow-control', () => {
  const plain = lazy(() => times(cylinderRig().build()));
  const fitted = lazy(() => times(cylinderRig({ lineB: meterOutB() }).build()));

  it('meters out: the extension (rod end exhausting 2→1) takes clearly longer', () => {
    expect(fitted().extend).toBeGreaterThan(1.5 * plain().extend);
  });

  it('leaves the free direction (1→2, filling the rod end) as it was', () => {
    expect(Math.abs(fitted().retract - plain().retract)).toBeLessThan(0.1 * plain().retract);
  });

  it('sends the exhaust through the throttle, not the check', () => {
    const { trace } = fitted();
    const mid = PRESS + 0.5 * fitted().extend;
    expect(valueAt(trace, 'fc:q:throttle', mid)).toBeLessThan(-1e-5);
    expect(valueAt(trace, 'fc:q:check', mid)).toBe(0);
  });

  it('throttles harder with a smaller opening', () => {
    const narrow = times(cylinderRig({ lineB: meterOutB(0.1) }).build());
    expect(narrow.extend).toBeGreaterThan(1.3 * fitted().extend);
  });
});
