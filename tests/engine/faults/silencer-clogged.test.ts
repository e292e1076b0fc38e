import { describe, expect, it } from 'vitest';
import { lazy } from '../components/harness';
import { cylinderRig } from '../components/harness';
import { runWith, strokes } from './rigs';

describe('silencer clogged', () => {
  // Without a flow control, the silencer on exhaust 3 is what limits the extension (rod end exhausting 4→… 2→3).
  const doc = cylinderRig().add('sil', 'silencer').tube('v:3', 'sil:1').build();
  const runs = lazy(() => [1, 0.3, 0.1].map((fraction) => strokes(runWith(doc, { faultId: 'silencer-clogged', tag: 'sil', severity: fraction }))));

  it('slows the stroke that exhausts through it, more as it clogs', () => {
    const [clean, some, bad] = runs().map((s) => s.extend);
    expect(some!).toBeGreaterThan(clean! * 1.1);
    expect(bad!).toBeGreaterThan(some! * 1.1);
  });

  it('leaves the stroke that exhausts elsewhere (through 5) as it was', () => {
    const [clean, , bad] = runs().map((s) => s.retract);
    expect(Math.abs(bad! - clean!)).toBeLessThan(0.02 * clean!);
  });
});
