import { describe, expect, it } from 'vitest';
import {
  ISO_LINEAR_REGION_EPSILON,
  chokedGain,
  isoFlowSource,
  isoLinearRegionPhi,
  signedIsoFlowPrepared,
  signedIsoFlowPreparedInto,
} from '@/engine/calc/iso6358';

const EPS = ISO_LINEAR_REGION_EPSILON;

/** The written flow law as a function of (gain, pa, pb, b, 1 − b, φ), without and with derivatives. */
function written(derivatives: boolean): (gain: number, pa: number, pb: number, b: number, oneMinusB: number, phi: number) => number[] {
  const names = { gain: 'gain', pa: 'pa', pb: 'pb', b: 'b', oneMinusB: 'oneMinusB', linearPhi: 'phi', flow: 'flow' };
  const source = derivatives ? isoFlowSource({ ...names, dPa: 'dPa', dPb: 'dPb' }, EPS) : isoFlowSource(names, EPS);
  return new Function('gain', 'pa', 'pb', 'b', 'oneMinusB', 'phi', `let flow = 0; let dPa = 0; let dPb = 0;\n${source}\nreturn [flow, dPa, dPb];`) as never;
}

describe('isoFlowSource', () => {
  const plain = written(false);
  const full = written(true);
  const gains = [0, chokedGain(1e-8, 293.15), chokedGain(3.7e-9, 310)];
  const ratios = [0.2, 0.45, 0.528];
  // Choked, subsonic, the linear region next to p2 = p1 and its edge, equal pressures, reverse flow, a non-positive upstream.
  const pairs: Array<[number, number]> = [
    [700_000, 101_325],
    [700_000, 500_000],
    [700_000, 699_400],
    [700_000, 700_000 * (1 - EPS)],
    [600_000, 600_000],
    [250_000, 640_000],
    [0, -5],
  ];

  it('computes what signedIsoFlowPrepared and signedIsoFlowPreparedInto compute, bit for bit', () => {
    let compared = 0;
    for (const b of ratios) {
      const phi = isoLinearRegionPhi(b, 0.5, EPS);
      for (const gain of gains) {
        for (const [pa, pb] of pairs) {
          const out = { flow: 0, dFlowdPa: 0, dFlowdPb: 0 };
          signedIsoFlowPreparedInto(out, gain, b, 0.5, pa, pb, EPS, phi);
          const [flow] = plain(gain, pa, pb, b, 1 - b, phi);
          expect(Object.is(flow, signedIsoFlowPrepared(gain, b, 0.5, pa, pb, EPS, phi))).toBe(true);
          const [withD, dPa, dPb] = full(gain, pa, pb, b, 1 - b, phi);
          expect([Object.is(withD, out.flow), Object.is(dPa, out.dFlowdPa), Object.is(dPb, out.dFlowdPb)]).toEqual([true, true, true]);
          compared += 1;
        }
      }
    }
    expect(compared).toBe(ratios.length * gains.length * pairs.length);
  });
});
