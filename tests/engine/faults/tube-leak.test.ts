import { describe, expect, it } from 'vitest';
import { lazy, rangeOver, valueAt } from '../components/harness';
import { clampRig, PRESS_S, RELEASE_S, runWith, strokes } from './rigs';

describe('tube leak', () => {
  const doc = clampRig().build();
  // The tube from the valve's port 4 to the cap end.
  const capLine = doc.tubes.find((t) => t.from.port === '4' && t.to.port === 'A')!.id;
  const healthy = lazy(() => runWith(doc));
  const leaking = lazy(() => runWith(doc, { faultId: 'tube-leak', tag: capLine, severity: 5e-9 }));

  it('lowers the pressure in the leaking line while it is fed', () => {
    const at = RELEASE_S - 0.05;
    expect(valueAt(leaking(), 'cyl:p:A', at)).toBeLessThan(valueAt(healthy(), 'cyl:p:A', at) - 10_000);
  });

  it('vents the line through the leak once it is fed, and not before', () => {
    expect(rangeOver(leaking(), `${capLine}:q:leak`, PRESS_S + 0.05, RELEASE_S).max).toBeGreaterThan(1e-4);
    expect(rangeOver(leaking(), `${capLine}:q:leak`, 0, PRESS_S).max).toBeLessThan(1e-9);
  });

  it('slows the extension it feeds', () => {
    expect(strokes(leaking()).extend).toBeGreaterThan(strokes(healthy()).extend);
  });
});
