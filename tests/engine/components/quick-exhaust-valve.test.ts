import { describe, expect, it } from 'vitest';
import type { TestCircuit } from '../support/circuit';
import { cylinderRig, eventsOf, lazy, pressFor, portBar, runCircuit, strokeTime } from './harness';

const PRESS = 0.3;
const RELEASE = 1.6;
const LINE_M = 3;

/** Cap-end line 3 m long; with `q`, a quick exhaust valve at the cylinder end of it. */
const longLine = (c: TestCircuit, valvePort: string, cylinderPort: string) => c.tube(valvePort, cylinderPort, LINE_M);
const withQev = (c: TestCircuit, valvePort: string, cylinderPort: string) => c.add('q', 'quick-exhaust-valve').tube(valvePort, 'q:1', LINE_M).tube('q:2', cylinderPort);

function run(lineA: typeof longLine) {
  const trace = runCircuit(cylinderRig({ lineA }).build(), pressFor('v', PRESS, RELEASE - PRESS), 3);
  return { trace, extend: strokeTime(trace, 'cyl', 'extended', PRESS), retract: strokeTime(trace, 'cyl', 'retracted', RELEASE) };
}

describe('quick-exhaust-valve', () => {
  const plain = lazy(() => run(longLine));
  const fitted = lazy(() => run(withQev));

  it('shortens the retraction (cap end exhausting) compared with exhausting back through the valve', () => {
    expect(fitted().retract).toBeLessThan(0.85 * plain().retract);
  });

  it('fills through 1→2 for the extension and holds supply pressure there', () => {
    expect(fitted().extend).toBeLessThan(0.5);
    expect(Math.abs(portBar(fitted().trace, 'q', '2', RELEASE - 0.05) - 6)).toBeLessThan(0.1);
  });

  it('opens its exhaust after the release, not before', () => {
    const exhausting = eventsOf(fitted().trace, 'q', 'switched', 'exhausting');
    expect(exhausting.length).toBeGreaterThan(0);
    expect(exhausting[0]!.t).toBeGreaterThan(RELEASE);
  });

  it('opens its exhaust once per exhaust stroke (no chatter between filling and exhausting)', () => {
    const exhausting = eventsOf(fitted().trace, 'q', 'switched', 'exhausting');
    expect(exhausting.length).toBeLessThanOrEqual(3);
  });
});
