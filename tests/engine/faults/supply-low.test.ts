import { describe, expect, it } from 'vitest';
import { lazy } from '../components/harness';
import { clampRig, endPressureDifference, runWith, strokes } from './rigs';

describe('supply pressure low', () => {
  const doc = clampRig().build();
  const runs = lazy(() => [600_000, 400_000, 250_000].map((pa) => runWith(doc, { faultId: 'supply-low', tag: 'sup', severity: pa })));

  it('lowers the end pressure that gives the clamping force, by the drop in supply', () => {
    const [six, four, low] = runs().map(endPressureDifference);
    expect(six! - four!).toBeCloseTo(200_000, -4);
    expect(four!).toBeGreaterThan(low!);
  });

  it('slows the extension', () => {
    const [six, four, low] = runs().map((t) => strokes(t).extend);
    expect(four!).toBeGreaterThan(six!);
    expect(low!).toBeGreaterThan(four!);
  });
});
