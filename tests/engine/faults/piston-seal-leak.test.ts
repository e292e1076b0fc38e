import { describe, expect, it } from 'vitest';
import { lazy } from '../components/harness';
import { clampRig, endPressureDifference, runWith, strokes } from './rigs';

describe('piston seal leak', () => {
  const doc = clampRig().build();
  const runs = lazy(() => [0, 1e-9, 2e-9].map((c) => runWith(doc, { faultId: 'piston-seal-leak', tag: 'cyl', severity: c })));

  it('slows the retraction, whose exhaust is not metered, more as the leak grows', () => {
    // The metered-out extension is another matter: early in it the rod side is the fuller one,
    // and the leak lets it blow down into the cap side, so it can even start sooner.
    const times = runs().map((t) => strokes(t).retract);
    expect(times[1]!).toBeGreaterThan(times[0]! * 1.02);
    expect(times[2]!).toBeGreaterThan(times[1]! * 1.02);
  });

  it('lowers the pressure difference that holds the extended piston', () => {
    const [healthy, some, more] = runs().map(endPressureDifference);
    // Air crossing the piston keeps the rod side up against its exhaust.
    expect(some!).toBeLessThan(healthy! - 20_000);
    expect(more!).toBeLessThan(some!);
  });
});
