import { describe, expect, it } from 'vitest';
import { KAPPA_AIR, R_AIR_J_PER_KG_K, RHO_0_KG_PER_M3, T0_K } from '@/engine/calc/constants';
import {
  anrLitresPerMinuteFromMass,
  anrVolumeFlowFromMass,
  chokedGain,
  dm3PerSBarToM3PerSPa,
  idealNozzleConductance,
  ISO_LINEAR_REGION_EPSILON,
  isoMassFlow,
  isoMassFlowSmooth,
  isoMassFlowSmoothWithDerivatives,
  m3PerSPaToDm3PerSBar,
  massFlowFromAnrLitresPerMinute,
  massFlowFromAnrVolume,
  isoLinearRegionPhi,
  signedIsoFlow,
  signedIsoFlowPrepared,
  signedIsoFlowPreparedInto,
} from '@/engine/calc/iso6358';

const C1 = 1e-8; // 1 dm³/(s·bar) in m³/(s·Pa)

describe('ISO 6358-1:2013 flow law', () => {
  it('gives C·ρ0·p1 in choked flow at T0', () => {
    // ISO 6358-1:2013 choked equation qm = C·ρ0·p1·√(T0/T1) (reference sheet §1.3).
    const qm = isoMassFlow({ conductance: C1, criticalRatio: 0.3, upstreamPa: 7e5, downstreamPa: 1e5 });
    expect(qm).toBeCloseTo(C1 * 1.185 * 7e5, 15);
    // In choked flow q_ANR = C·p1: 7 × 10⁻³ m³/s = 420 l/min (ANR).
    expect(anrLitresPerMinuteFromMass(qm)).toBeCloseTo(420, 10);
  });

  it('scales choked flow with √(T0/T1)', () => {
    // ISO 6358-1:2013 temperature correction √(T0/T1) (reference sheet §1.3).
    const at = (t: number) =>
      isoMassFlow({ conductance: C1, criticalRatio: 0.3, upstreamPa: 7e5, downstreamPa: 1e5, upstreamTempK: t });
    expect(at(1.21 * T0_K) / at(T0_K)).toBeCloseTo(1 / 1.1, 12);
  });

  it('keeps choked flow independent of p2 below b', () => {
    // ISO 6358-1:2013: for p2/p1 ≤ b the flow depends on p1 only.
    const flows = [0, 0.5e5, 1e5, 2e5, 2.8e5].map((p2) =>
      isoMassFlow({ conductance: C1, criticalRatio: 0.4, upstreamPa: 7e5, downstreamPa: p2 }),
    );
    for (const q of flows) expect(q).toBe(flows[0]);
    const smooth = [0.5e5, 2e5, 2.8e5].map((p2) =>
      isoMassFlowSmoothWithDerivatives({ conductance: C1, criticalRatio: 0.4, upstreamPa: 7e5, downstreamPa: p2 }),
    );
    for (const s of smooth) {
      expect(s.flow).toBe(flows[0]);
      expect(s.dFlowdP2).toBe(0);
    }
  });

  it.each([
    [0.2, 239.5],
    [0.3, 254.3],
    [0.4, 272.0],
    [0.5, 293.9],
    [0.528, 301.0],
  ])('gives the nominal flow QN for C = 1 dm³/(s·bar), b = %f: %f l/min (ANR)', (b, qn) => {
    // Derived in shared reference sheet §1.4 from the ISO 6358-1:2013 subsonic equation at p1 = 7, p2 = 6 bar abs, m = 0.5.
    const qm = isoMassFlow({ conductance: C1, criticalRatio: b, upstreamPa: 7e5, downstreamPa: 6e5 });
    expect(anrLitresPerMinuteFromMass(qm)).toBeCloseTo(qn, 1);
  });

  it('returns zero for no or reverse pressure difference', () => {
    // ISO 6358-1:2013 describes one direction, p2 ≤ p1 (reference sheet §1.3).
    expect(isoMassFlow({ conductance: C1, criticalRatio: 0.3, upstreamPa: 5e5, downstreamPa: 5e5 })).toBe(0);
    expect(isoMassFlow({ conductance: C1, criticalRatio: 0.3, upstreamPa: 5e5, downstreamPa: 6e5 })).toBe(0);
  });

  it('applies the subsonic index m', () => {
    // ISO 6358-1:2013 subsonic equation with exponent m; at p2/p1 = b + (1 − b)/2 the bracket is 3/4.
    const q = (m: number) =>
      isoMassFlow({ conductance: C1, criticalRatio: 0.2, subsonicIndex: m, upstreamPa: 5e5, downstreamPa: 3e5 });
    const choked = C1 * RHO_0_KG_PER_M3 * 5e5;
    expect(q(0.5) / choked).toBeCloseTo(Math.sqrt(0.75), 12);
    expect(q(0.7) / choked).toBeCloseTo(Math.pow(0.75, 0.7), 12);
  });

  it('rejects parameters outside their ranges', () => {
    const ok = { conductance: C1, criticalRatio: 0.3, upstreamPa: 5e5, downstreamPa: 1e5 };
    expect(() => isoMassFlow({ ...ok, criticalRatio: 1 })).toThrow(RangeError);
    expect(() => isoMassFlow({ ...ok, conductance: -1e-9 })).toThrow(RangeError);
    expect(() => isoMassFlow({ ...ok, subsonicIndex: 0 })).toThrow(RangeError);
    expect(() => isoMassFlow({ ...ok, upstreamTempK: 0 })).toThrow(RangeError);
  });
});

describe('conversions around C and ANR flow', () => {
  it('converts dm³/(s·bar) to m³/(s·Pa) by 10⁻⁸', () => {
    // Derived in shared reference sheet §1.2: 1 dm³ = 10⁻³ m³, 1 bar = 10⁵ Pa (exact unit change).
    expect(dm3PerSBarToM3PerSPa(1)).toBe(1e-8);
    expect(dm3PerSBarToM3PerSPa(2.5)).toBeCloseTo(2.5e-8, 22);
    expect(m3PerSPaToDm3PerSBar(dm3PerSBarToM3PerSPa(3.7))).toBeCloseTo(3.7, 12);
  });

  it('turns 100 l/min (ANR) into 1.975 × 10⁻³ kg/s', () => {
    // Derived in shared reference sheet §10 from qm = q·ρ0 with ρ0 = 1.185 kg/m³ (ISO 6358-1:2013).
    expect(massFlowFromAnrLitresPerMinute(100)).toBeCloseTo(1.975e-3, 9);
    expect(anrLitresPerMinuteFromMass(1.975e-3)).toBeCloseTo(100, 9);
    expect(anrVolumeFlowFromMass(massFlowFromAnrVolume(0.01))).toBeCloseTo(0.01, 15);
  });
});

describe('cross-check with isentropic nozzle flow', () => {
  const k = KAPPA_AIR;
  // Isentropic flow function of a convergent nozzle (St Venant–Wantzel, textbook gas dynamics).
  const psi = (r: number) => Math.sqrt(Math.pow(r, 2 / k) - Math.pow(r, (k + 1) / k));
  const rCrit = Math.pow(2 / (k + 1), k / (k - 1));

  it('gives C = 1.5645 × 10⁻⁹ m³/(s·Pa) for a 1 mm nozzle with Cd = 1', () => {
    // Derived in shared reference sheet §1.3 from C = Cd·A·K/(ρ0·√T0), K = 0.040 415 s·K^0.5/m.
    const c = idealNozzleConductance(0.001, 1);
    expect(c / 1e-9).toBeCloseTo(1.5645, 4);
    expect(m3PerSPaToDm3PerSBar(c)).toBeCloseTo(0.156, 3);
    // Same choked flow as gas dynamics: K·A·p1/√T1 (textbook choked nozzle flow).
    const kFactor = Math.sqrt(k / R_AIR_J_PER_KG_K) * Math.pow(2 / (k + 1), (k + 1) / (2 * (k - 1)));
    const direct = (kFactor * Math.PI * 1e-6 * 6e5) / 4 / Math.sqrt(T0_K);
    const iso = isoMassFlow({ conductance: c, criticalRatio: 0.5283, upstreamPa: 6e5, downstreamPa: 1e5 });
    expect(iso / direct).toBeCloseTo(1, 12);
  });

  it('follows the nozzle curve within 0.3 % of choked flow for b = 0.5283, m = 0.5', () => {
    // Derived in shared reference sheet §1.3: the ISO ellipse reproduces the isentropic nozzle within about 0.3 %.
    expect(rCrit).toBeCloseTo(0.5283, 4);
    for (let r = 0.53; r < 0.9999; r += 0.001) {
      const iso = isoMassFlow({ conductance: 1e-8, criticalRatio: 0.5283, upstreamPa: 1e6, downstreamPa: r * 1e6 });
      const iso01 = iso / (1e-8 * RHO_0_KG_PER_M3 * 1e6);
      expect(Math.abs(iso01 - psi(r) / psi(rCrit))).toBeLessThan(0.003);
    }
  });
});

describe('smooth (solver) variant', () => {
  const params = { conductance: 2e-8, criticalRatio: 0.3, subsonicIndex: 0.5 };
  const at = (p1: number, p2: number) => isoMassFlowSmoothWithDerivatives({ ...params, upstreamPa: p1, downstreamPa: p2 });

  it('uses ε = 10⁻³ for the linear region', () => {
    // Reference sheet §1.3 notes: linearising for p2/p1 > 0.999 is common solver practice, not ISO 6358-1.
    expect(ISO_LINEAR_REGION_EPSILON).toBe(1e-3);
  });

  it('equals the ISO curve up to p2/p1 = 1 − ε', () => {
    for (const r of [0, 0.2, 0.3, 0.5, 0.8, 0.95, 0.998, 0.999]) {
      const p1 = 6e5;
      const iso = isoMassFlow({ ...params, upstreamPa: p1, downstreamPa: r * p1 });
      expect(isoMassFlowSmooth({ ...params, upstreamPa: p1, downstreamPa: r * p1 })).toBe(iso);
    }
  });

  it('joins the ISO curve continuously at the joint', () => {
    // Reference sheet §1.3: test continuity of the linearised region, not agreement with ISO inside it.
    const p1 = 6e5;
    const joint = (1 - ISO_LINEAR_REGION_EPSILON) * p1;
    const below = at(p1, joint * (1 - 1e-13)).flow;
    const above = at(p1, joint * (1 + 1e-13)).flow;
    expect(Math.abs(above - below) / below).toBeLessThan(1e-9);
  });

  it('is linear in p1 − p2 inside the region and zero at p1 = p2', () => {
    const p1 = 6e5;
    const a = at(p1, p1 * (1 - 2e-4)).flow;
    const b = at(p1, p1 * (1 - 4e-4)).flow;
    expect(b / a).toBeCloseTo(2, 10);
    expect(at(p1, p1).flow).toBe(0);
  });

  it('has finite derivatives at p1 = p2 equal to the linear-region slope', () => {
    const d = at(5e5, 5e5);
    expect(Number.isFinite(d.dFlowdP1)).toBe(true);
    expect(Number.isFinite(d.dFlowdP2)).toBe(true);
    expect(d.dFlowdP1).toBeGreaterThan(0);
    expect(d.dFlowdP2).toBe(-d.dFlowdP1);
  });

  it.each([
    ['choked', 7e5, 1e5],
    ['subsonic', 7e5, 5e5],
    ['near the joint', 7e5, 7e5 * 0.9985],
    ['linear', 7e5, 7e5 * 0.9996],
  ])('has derivatives that match finite differences (%s)', (_name, p1, p2) => {
    const d = at(p1, p2);
    const h = 1e-3;
    const fd1 = (at(p1 + h, p2).flow - at(p1 - h, p2).flow) / (2 * h);
    const fd2 = (at(p1, p2 + h).flow - at(p1, p2 - h).flow) / (2 * h);
    const scale = Math.abs(d.dFlowdP1) + Math.abs(d.dFlowdP2);
    expect(Math.abs(fd1 - d.dFlowdP1) / scale).toBeLessThan(1e-5);
    expect(Math.abs(fd2 - d.dFlowdP2) / scale).toBeLessThan(1e-5);
  });

  it('gives zero flow and derivatives for p2 > p1', () => {
    expect(at(5e5, 5.1e5)).toEqual({ flow: 0, dFlowdP1: 0, dFlowdP2: 0 });
  });
});

describe('signed bidirectional flow', () => {
  const sf = (pa: number, pb: number) => signedIsoFlow(2e-8, 0.3, 0.5, pa, pb, T0_K);

  it('is antisymmetric with swapped derivatives', () => {
    for (const [pa, pb] of [
      [7e5, 1e5],
      [7e5, 5e5],
      [5e5, 4.999e5],
      [3e5, 6e5],
    ] as const) {
      const ab = sf(pa, pb);
      const ba = sf(pb, pa);
      expect(ba.flow).toBe(-ab.flow);
      expect(ba.dFlowdPa).toBe(-ab.dFlowdPb);
      expect(ba.dFlowdPb).toBe(-ab.dFlowdPa);
    }
    expect(sf(7e5, 1e5).flow).toBeGreaterThan(0);
    expect(sf(1e5, 7e5).flow).toBeLessThan(0);
  });

  it('is continuous with finite, continuous derivatives across pa = pb', () => {
    const p = 4e5;
    const mid = sf(p, p);
    expect(mid.flow).toBe(0);
    const delta = 2 ** -10; // Pa; exactly representable next to 4 × 10⁵ Pa
    const left = sf(p - delta, p);
    const right = sf(p + delta, p);
    // A tiny imbalance gives slope × Δp, in the matching direction.
    expect(left.flow / (-mid.dFlowdPa * delta)).toBeCloseTo(1, 9);
    expect(right.flow / (mid.dFlowdPa * delta)).toBeCloseTo(1, 9);
    expect(left.flow).toBeLessThan(0);
    expect(right.flow).toBeGreaterThan(0);
    for (const s of [left, mid, right]) {
      expect(Number.isFinite(s.dFlowdPa)).toBe(true);
      expect(s.dFlowdPa).toBeCloseTo(mid.dFlowdPa, 20);
      expect(s.dFlowdPb).toBeCloseTo(mid.dFlowdPb, 20);
    }
  });

  it('matches the one-directional smooth flow in the forward direction', () => {
    const f = isoMassFlowSmooth({ conductance: 2e-8, criticalRatio: 0.3, upstreamPa: 6e5, downstreamPa: 4e5 });
    expect(sf(6e5, 4e5).flow).toBe(f);
  });

  it('gives the same flow bit for bit without derivatives as with them, in every region and both directions', () => {
    // The solver's stage evaluations use the value-only form; a step must not depend on which was used.
    const out = { flow: 0, dFlowdPa: 0, dFlowdPb: 0 };
    const gain = chokedGain(2e-8, T0_K);
    for (const b of [0.3, 0.5]) {
      const phi = isoLinearRegionPhi(b, 0.5, ISO_LINEAR_REGION_EPSILON);
      for (const [pa, pb] of [
        [7e5, 1e5], // choked
        [7e5, 5e5], // subsonic
        [5e5, 4.9999e5], // linear region
        [3e5, 6e5], // reversed
        [4e5, 4e5], // no difference
        [0, 2e5], // empty upstream node
      ] as const) {
        signedIsoFlowPreparedInto(out, gain, b, 0.5, pa, pb, ISO_LINEAR_REGION_EPSILON, phi);
        expect(signedIsoFlowPrepared(gain, b, 0.5, pa, pb, ISO_LINEAR_REGION_EPSILON, phi)).toBe(out.flow);
      }
    }
  });
});
