/**
 * Flow through a restriction described by its ISO 6358-1:2013 characteristics:
 * sonic conductance C, critical back-pressure ratio b and subsonic index m.
 *
 * All pressures are absolute pascals, temperatures kelvin, mass flows kg/s and C is in m³/(s·Pa) (ANR).
 * The form of the equations follows the shared reference sheet §1.3 (tagged there as recalled, not read
 * from the standard's text); check against ISO 6358-1:2013 itself.
 */

import { KAPPA_AIR, R_AIR_J_PER_KG_K, RHO_0_KG_PER_M3, T0_K } from './constants';
import { M3_PER_S_PER_L_PER_MIN } from './units';

/** Inputs of the one-directional ISO 6358 flow law. */
export interface IsoFlowInput {
  /** Sonic conductance C, m³/(s·Pa) (ANR). Must be ≥ 0. */
  conductance: number;
  /** Critical back-pressure ratio b, dimensionless, 0 ≤ b < 1. */
  criticalRatio: number;
  /** Subsonic index m, dimensionless, > 0. Defaults to 0.5 (the fixed value of the 1989 edition). */
  subsonicIndex?: number;
  /** Upstream absolute pressure p1, Pa. */
  upstreamPa: number;
  /** Downstream absolute pressure p2, Pa. */
  downstreamPa: number;
  /** Upstream absolute temperature T1, K. Defaults to T0 = 293.15 K. */
  upstreamTempK?: number;
}

/** Flow value with its partial derivatives, for the solver's Jacobian. */
export interface FlowWithDerivatives {
  /** Mass flow, kg/s. */
  flow: number;
  /** ∂flow/∂p1, kg/(s·Pa). */
  dFlowdP1: number;
  /** ∂flow/∂p2, kg/(s·Pa). */
  dFlowdP2: number;
}

/** Signed flow a→b with its partial derivatives. */
export interface SignedFlowWithDerivatives {
  /** Mass flow, kg/s; positive from a to b, negative from b to a. */
  flow: number;
  /** ∂flow/∂pa, kg/(s·Pa). */
  dFlowdPa: number;
  /** ∂flow/∂pb, kg/(s·Pa). */
  dFlowdPb: number;
}

/**
 * Width ε of the linearised region next to p2/p1 = 1 used by the smooth variants.
 * [PRACTICE] solver choice (reference sheet §1.3, validity notes), not part of ISO 6358-1:
 * for p2/p1 > 1 − ε the flow is taken linear in (p1 − p2) so that its derivative stays bounded.
 */
export const ISO_LINEAR_REGION_EPSILON = 1e-3;

interface Checked {
  c: number;
  b: number;
  m: number;
  p1: number;
  p2: number;
  t1: number;
}

function check(input: IsoFlowInput): Checked {
  const { conductance: c, criticalRatio: b, upstreamPa: p1, downstreamPa: p2 } = input;
  const m = input.subsonicIndex ?? 0.5;
  const t1 = input.upstreamTempK ?? T0_K;
  if (!(c >= 0) || !Number.isFinite(c)) throw new RangeError(`conductance must be finite and ≥ 0, got ${c}`);
  if (!(b >= 0 && b < 1)) throw new RangeError(`criticalRatio must satisfy 0 ≤ b < 1, got ${b}`);
  if (!(m > 0) || !Number.isFinite(m)) throw new RangeError(`subsonicIndex must be finite and > 0, got ${m}`);
  if (!(t1 > 0) || !Number.isFinite(t1)) throw new RangeError(`upstreamTempK must be finite and > 0, got ${t1}`);
  if (!Number.isFinite(p1) || !Number.isFinite(p2)) throw new RangeError('pressures must be finite');
  return { c, b, m, p1, p2, t1 };
}

/** Choked-flow gain C·ρ0·√(T0/T1), kg/(s·Pa): choked mass flow per pascal of upstream pressure. */
export function chokedGain(c: number, t1: number): number {
  return c * RHO_0_KG_PER_M3 * Math.sqrt(T0_K / t1);
}

/**
 * Normalised ISO flow function φ(r) = [1 − ((r − b)/(1 − b))²]^m for b < r ≤ 1, and 1 for r ≤ b,
 * with its derivative dφ/dr. Only called for r < 1 where the derivative is finite.
 */
function shape(r: number, b: number, m: number): { phi: number; dPhi: number } {
  if (r <= b) return { phi: 1, dPhi: 0 };
  const x = (r - b) / (1 - b);
  const u = 1 - x * x;
  if (u <= 0) return { phi: 0, dPhi: 0 };
  const phi = Math.pow(u, m);
  const dPhi = (m * phi) / u * ((-2 * x) / (1 - b));
  return { phi, dPhi };
}

/**
 * ISO 6358-1:2013 mass flow through a component, kg/s, one direction only.
 *
 * - Choked, p2/p1 ≤ b: qm = C·ρ0·p1·√(T0/T1).
 * - Subsonic, b < p2/p1 < 1: qm = C·ρ0·p1·√(T0/T1)·[1 − ((p2/p1 − b)/(1 − b))²]^m.
 * - p2 ≥ p1 (or p1 ≤ 0): 0. For reverse flow swap the ports (and use the reverse C, b).
 *
 * Source: ISO 6358-1:2013 equations as given in the reference sheet §1.3; ρ0 = 1.185 kg/m³, T0 = 293.15 K.
 */
export function isoMassFlow(input: IsoFlowInput): number {
  const { c, b, m, p1, p2, t1 } = check(input);
  if (p1 <= 0 || p2 >= p1) return 0;
  return chokedGain(c, t1) * p1 * shape(p2 / p1, b, m).phi;
}

/**
 * Solver-friendly ISO flow with partial derivatives, kg/s and kg/(s·Pa).
 *
 * Identical to {@link isoMassFlow} for p2/p1 ≤ 1 − ε. For 1 − ε < p2/p1 ≤ 1 it is linear in (p1 − p2):
 * qm = G·φ(1 − ε)·(p1 − p2)/ε with G = C·ρ0·√(T0/T1). At the joint p1 − p2 = ε·p1, so both pieces give
 * G·p1·φ(1 − ε) and the value is continuous. The slope G·φ(1 − ε)/ε does not depend on pressure, which keeps
 * the derivatives bounded (the ISO curve's ∂qm/∂p2 is unbounded at p2 = p1 for m < 1).
 * ε defaults to {@link ISO_LINEAR_REGION_EPSILON} ([PRACTICE], not ISO 6358-1).
 *
 * For p2 > p1 the result is 0 with zero derivatives; at p2 = p1 exactly the flow is 0 and the derivatives
 * are the linear-region slope (its limit from the forward side).
 */
export function isoMassFlowSmoothWithDerivatives(
  input: IsoFlowInput,
  epsilon: number = ISO_LINEAR_REGION_EPSILON,
): FlowWithDerivatives {
  const { c, b, m, p1, p2, t1 } = check(input);
  if (!(epsilon > 0 && epsilon < 1)) throw new RangeError(`epsilon must satisfy 0 < ε < 1, got ${epsilon}`);
  if (p1 <= 0 || p2 > p1) return { flow: 0, dFlowdP1: 0, dFlowdP2: 0 };
  const out = { flow: 0, dFlowdPa: 0, dFlowdPb: 0 };
  signedIsoFlowInto(out, chokedGain(c, t1), b, m, p1, p2, epsilon);
  return { flow: out.flow, dFlowdP1: out.dFlowdPa, dFlowdP2: out.dFlowdPb };
}

/**
 * Allocation-free core of the smooth flow between a and b, written into `out`
 * (positive a→b). `gain` is {@link chokedGain}; inputs are trusted, so the
 * solver's inner loop can call it millions of times without checks or garbage.
 */
export function signedIsoFlowInto(out: SignedFlowWithDerivatives, gain: number, b: number, m: number, pa: number, pb: number, epsilon: number): void {
  signedIsoFlowPreparedInto(out, gain, b, m, pa, pb, epsilon, isoLinearRegionPhi(b, m, epsilon));
}

/** φ(1 − ε) for critical ratio b and subsonic index m: fixes the slope of the linearised region (see {@link signedIsoFlowInto}). */
export function isoLinearRegionPhi(b: number, m: number, epsilon: number): number {
  return shape(1 - epsilon, b, m).phi;
}

/**
 * {@link signedIsoFlowInto} with φ(1 − ε) worked out beforehand by {@link isoLinearRegionPhi}
 * (it depends only on b, m and ε), for the solver's inner loop. Same results bit for bit.
 */
export function signedIsoFlowPreparedInto(
  out: SignedFlowWithDerivatives,
  gain: number,
  b: number,
  m: number,
  pa: number,
  pb: number,
  epsilon: number,
  linearPhi: number,
): void {
  const forward = pa >= pb;
  const p1 = forward ? pa : pb;
  const p2 = forward ? pb : pa;
  let flow = 0;
  let d1 = 0;
  let d2 = 0;
  if (p1 > 0 && gain > 0) {
    const r = p2 / p1;
    if (r > 1 - epsilon) {
      const slope = (gain * linearPhi) / epsilon;
      flow = slope * (p1 - p2);
      d1 = slope;
      d2 = -slope;
    } else if (r <= b) {
      flow = gain * p1;
      d1 = gain;
    } else {
      const x = (r - b) / (1 - b);
      const u = 1 - x * x;
      const phi = m === 0.5 ? Math.sqrt(u) : Math.pow(u, m);
      const dPhi = ((m * phi) / u) * ((-2 * x) / (1 - b));
      // qm = G·p1·φ(p2/p1): ∂/∂p1 = G·(φ − r·φ'), ∂/∂p2 = G·φ'.
      flow = gain * p1 * phi;
      d1 = gain * (phi - r * dPhi);
      d2 = gain * dPhi;
    }
  }
  if (forward) {
    out.flow = flow;
    out.dFlowdPa = d1;
    out.dFlowdPb = d2;
  } else {
    out.flow = -flow;
    out.dFlowdPa = -d2;
    out.dFlowdPb = -d1;
  }
}

/**
 * The flow of {@link signedIsoFlowPreparedInto} without its derivatives, kg/s (positive a→b):
 * the solver's stage evaluations need no Jacobian. Same value bit for bit.
 */
export function signedIsoFlowPrepared(gain: number, b: number, m: number, pa: number, pb: number, epsilon: number, linearPhi: number): number {
  const forward = pa >= pb;
  const p1 = forward ? pa : pb;
  const p2 = forward ? pb : pa;
  let flow = 0;
  if (p1 > 0 && gain > 0) {
    const r = p2 / p1;
    if (r > 1 - epsilon) flow = ((gain * linearPhi) / epsilon) * (p1 - p2);
    else if (r <= b) flow = gain * p1;
    else {
      const x = (r - b) / (1 - b);
      const u = 1 - x * x;
      flow = gain * p1 * (m === 0.5 ? Math.sqrt(u) : Math.pow(u, m));
    }
  }
  return forward ? flow : -flow;
}

/**
 * The flow law of {@link signedIsoFlowPrepared} (or, with `dPa` and `dPb`, of
 * {@link signedIsoFlowPreparedInto}) with m = 0.5, as JavaScript statements: the solver writes a
 * partition's right-hand side out as straight-line code, where calls would not be inlined. The
 * statements read the expressions named for the gain, pa, pb, b, 1 − b and φ(1 − ε) and set the
 * variables named `flow` (and `dPa`, `dPb`), which the caller declares; ε is a literal. The
 * operations and their order are those of the functions, so the results are the same bit for bit
 * (tests/engine/calc/iso-flow-source.test.ts compares them).
 */
export function isoFlowSource(
  names: { gain: string; pa: string; pb: string; b: string; oneMinusB: string; linearPhi: string; flow: string; dPa?: string; dPb?: string },
  epsilon: number,
): string {
  const { gain, pa, pb, b, oneMinusB, linearPhi, flow, dPa, dPb } = names;
  const derivatives = dPa !== undefined && dPb !== undefined;
  const lines = [
    '{',
    `const forward = ${pa} >= ${pb};`,
    `const p1 = forward ? ${pa} : ${pb};`,
    `const p2 = forward ? ${pb} : ${pa};`,
    derivatives ? 'let q = 0; let d1 = 0; let d2 = 0;' : 'let q = 0;',
    `if (p1 > 0 && ${gain} > 0) {`,
    'const r = p2 / p1;',
    `if (r > ${String(1 - epsilon)}) {`,
    derivatives
      ? `const slope = (${gain} * ${linearPhi}) / ${String(epsilon)}; q = slope * (p1 - p2); d1 = slope; d2 = -slope;`
      : `q = ((${gain} * ${linearPhi}) / ${String(epsilon)}) * (p1 - p2);`,
    `} else if (r <= ${b}) {`,
    derivatives ? `q = ${gain} * p1; d1 = ${gain};` : `q = ${gain} * p1;`,
    '} else {',
    `const x = (r - ${b}) / ${oneMinusB};`,
    'const u = 1 - x * x;',
    'const phi = Math.sqrt(u);',
    derivatives
      ? `const dPhi = ((0.5 * phi) / u) * ((-2 * x) / ${oneMinusB}); q = ${gain} * p1 * phi; d1 = ${gain} * (phi - r * dPhi); d2 = ${gain} * dPhi;`
      : `q = ${gain} * p1 * phi;`,
    '}',
    '}',
    derivatives
      ? `if (forward) { ${flow} = q; ${dPa} = d1; ${dPb} = d2; } else { ${flow} = -q; ${dPa} = -d2; ${dPb} = -d1; }`
      : `${flow} = forward ? q : -q;`,
    '}',
  ];
  return lines.join('\n');
}

/** Value of {@link isoMassFlowSmoothWithDerivatives} only, kg/s. */
export function isoMassFlowSmooth(input: IsoFlowInput, epsilon: number = ISO_LINEAR_REGION_EPSILON): number {
  return isoMassFlowSmoothWithDerivatives(input, epsilon).flow;
}

/**
 * Bidirectional smooth ISO flow between nodes a and b, kg/s: positive a→b, negative b→a.
 * Uses the same C, b, m in both directions (for direction-dependent data, call the one-directional
 * function per direction). Zero at pa = pb, where both sides share the linear-region slope, so value and
 * derivatives are continuous across pa = pb and finite everywhere. T is the upstream temperature, K.
 */
export function signedIsoFlow(
  conductance: number,
  criticalRatio: number,
  subsonicIndex: number,
  pa: number,
  pb: number,
  temperatureK: number = T0_K,
  epsilon: number = ISO_LINEAR_REGION_EPSILON,
): SignedFlowWithDerivatives {
  check({ conductance, criticalRatio, subsonicIndex, upstreamPa: pa, downstreamPa: pb, upstreamTempK: temperatureK });
  const out = { flow: 0, dFlowdPa: 0, dFlowdPb: 0 };
  signedIsoFlowInto(out, chokedGain(conductance, temperatureK), criticalRatio, subsonicIndex, pa, pb, epsilon);
  return out;
}

/** Mass flow, kg/s → volume flow at ANR, m³/s (ANR): q = qm/ρ0 (ISO 6358-1:2013, ρ0 = 1.185 kg/m³). */
export function anrVolumeFlowFromMass(kgPerS: number): number {
  return kgPerS / RHO_0_KG_PER_M3;
}

/** Volume flow at ANR, m³/s (ANR) → mass flow, kg/s: qm = q·ρ0. */
export function massFlowFromAnrVolume(m3PerS: number): number {
  return m3PerS * RHO_0_KG_PER_M3;
}

/** Mass flow, kg/s → l/min (ANR). */
export function anrLitresPerMinuteFromMass(kgPerS: number): number {
  return anrVolumeFlowFromMass(kgPerS) / M3_PER_S_PER_L_PER_MIN;
}

/** l/min (ANR) → mass flow, kg/s. */
export function massFlowFromAnrLitresPerMinute(lpm: number): number {
  return massFlowFromAnrVolume(lpm * M3_PER_S_PER_L_PER_MIN);
}

/** Sonic conductance in the legacy unit dm³/(s·bar) → m³/(s·Pa): × 10⁻⁸ (exact unit change). */
export function dm3PerSBarToM3PerSPa(value: number): number {
  return value / 1e8;
}

/** Sonic conductance in m³/(s·Pa) → dm³/(s·bar): × 10⁸ (exact unit change). */
export function m3PerSPaToDm3PerSBar(value: number): number {
  return value * 1e8;
}

/**
 * Sonic conductance of an ideal convergent nozzle, m³/(s·Pa): C = Cd·A·K/(ρ0·√T0), where
 * K = √(κ/R)·(2/(κ + 1))^((κ + 1)/(2(κ − 1))) is the choked-flow factor of isentropic nozzle flow.
 * Obtained by equating the gas-dynamic choked flow K·A·p1/√T1 with the ISO 6358 choked form
 * (derived in the reference sheet §1.3). Its natural b is (2/(κ + 1))^(κ/(κ − 1)) ≈ 0.528.
 */
export function idealNozzleConductance(diameterM: number, dischargeCoefficient: number = 1): number {
  if (!(diameterM >= 0)) throw new RangeError(`diameterM must be ≥ 0, got ${diameterM}`);
  const k = KAPPA_AIR;
  const factor = Math.sqrt(k / R_AIR_J_PER_KG_K) * Math.pow(2 / (k + 1), (k + 1) / (2 * (k - 1)));
  const area = (Math.PI * diameterM * diameterM) / 4;
  return (dischargeCoefficient * area * factor) / (RHO_0_KG_PER_M3 * Math.sqrt(T0_K));
}
