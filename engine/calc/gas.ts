/**
 * Ideal-gas helpers for air and a closed-form fill time used to check the solver.
 * Pressures are absolute pascals, temperatures kelvin, volumes m³, masses kg, times s.
 * Formulas: textbook thermodynamics as collected in the reference sheet §2–§3.
 */

import { KAPPA_AIR, P_ANR_PA, R_AIR_J_PER_KG_K, RHO_0_KG_PER_M3, T0_K } from './constants';

function positive(name: string, value: number): void {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`${name} must be finite and > 0, got ${value}`);
}

/** Mass of air in a volume, kg: m = p·V/(R·T) (ideal gas law). */
export function gasMass(pressurePa: number, volumeM3: number, temperatureK: number = T0_K): number {
  positive('temperatureK', temperatureK);
  return (pressurePa * volumeM3) / (R_AIR_J_PER_KG_K * temperatureK);
}

/** Density of air, kg/m³: ρ = p/(R·T) (ideal gas law, dry air). */
export function gasDensity(pressurePa: number, temperatureK: number = T0_K): number {
  positive('temperatureK', temperatureK);
  return pressurePa / (R_AIR_J_PER_KG_K * temperatureK);
}

/**
 * Free-air volume at ANR of a gas state, m³ (ANR): V_ANR = V·(p/p0)·(T0/T), p0 = 100 kPa, T0 = 293.15 K
 * (ISO 8778:2003 reference atmosphere; dry-gas basis; reference sheet §2).
 */
export function anrVolume(volumeM3: number, pressurePa: number, temperatureK: number = T0_K): number {
  positive('temperatureK', temperatureK);
  return volumeM3 * (pressurePa / P_ANR_PA) * (T0_K / temperatureK);
}

/** Pressure after isothermal compression by volume ratio V1/V2, Pa: p2 = p1·(V1/V2) (Boyle). */
export function isothermalCompressionPressure(startPa: number, volumeRatio: number): number {
  positive('volumeRatio', volumeRatio);
  return startPa * volumeRatio;
}

/** Pressure after isentropic compression by volume ratio V1/V2, Pa: p2 = p1·(V1/V2)^κ. */
export function isentropicCompressionPressure(startPa: number, volumeRatio: number, kappa: number = KAPPA_AIR): number {
  positive('volumeRatio', volumeRatio);
  return startPa * Math.pow(volumeRatio, kappa);
}

/** Temperature after isentropic compression by volume ratio V1/V2, K: T2 = T1·(V1/V2)^(κ − 1). */
export function isentropicCompressionTemperature(
  startK: number,
  volumeRatio: number,
  kappa: number = KAPPA_AIR,
): number {
  positive('volumeRatio', volumeRatio);
  return startK * Math.pow(volumeRatio, kappa - 1);
}

/** Pressure of a closed rigid vessel after a temperature change, Pa: p2 = p1·T2/T1 (combined gas law). */
export function isochoricPressure(startPa: number, startK: number, endK: number): number {
  positive('startK', startK);
  return (startPa * endK) / startK;
}

/** Inputs of {@link fillTimeClosedForm}. */
export interface FillTimeInput {
  /** Rigid volume being filled, m³. */
  volumeM3: number;
  /** Supply absolute pressure p_s, Pa. */
  supplyPa: number;
  /** Initial absolute pressure in the volume, Pa. */
  startPa: number;
  /** Final absolute pressure in the volume, Pa (startPa ≤ endPa ≤ supplyPa). */
  endPa: number;
  /** Sonic conductance of the feed restriction, m³/(s·Pa) (ANR). */
  C: number;
  /** Critical back-pressure ratio of the feed restriction. */
  b: number;
  /** Polytropic index: 1 isothermal, κ = 1.4 adiabatic with inflow at supply temperature. */
  n: number;
  /** Supply temperature, K. Defaults to T0. */
  T?: number;
  /** Subsonic index of the restriction; only m = 0.5 has this closed form. Defaults to 0.5. */
  m?: number;
}

/**
 * Time to fill a rigid volume from startPa to endPa through an ISO 6358 restriction, s (reference sheet §3.2,
 * derived there from the polytropic chamber equation dp/dt = (n·R·T/V)·qm with the ISO 6358-1 flow law).
 *
 * With K_p = n·R·T·C·ρ0·p_s·√(T0/T)/V (Pa/s):
 * - choked part (p ≤ b·p_s): pressure rises linearly, t = Δp/K_p;
 * - subsonic part (m = 0.5): with x = (p/p_s − b)/(1 − b), t = p_s·(1 − b)·(arcsin x_end − arcsin x_start)/K_p.
 */
export function fillTimeClosedForm(input: FillTimeInput): number {
  const { volumeM3, supplyPa, startPa, endPa, C, b, n } = input;
  const t = input.T ?? T0_K;
  const m = input.m ?? 0.5;
  positive('volumeM3', volumeM3);
  positive('supplyPa', supplyPa);
  positive('C', C);
  positive('T', t);
  if (!(n >= 1 && n <= KAPPA_AIR)) throw new RangeError(`n must satisfy 1 ≤ n ≤ κ, got ${n}`);
  if (!(b >= 0 && b < 1)) throw new RangeError(`b must satisfy 0 ≤ b < 1, got ${b}`);
  if (!(startPa >= 0 && startPa <= endPa && endPa <= supplyPa)) {
    throw new RangeError('pressures must satisfy 0 ≤ startPa ≤ endPa ≤ supplyPa');
  }
  const rate = (n * R_AIR_J_PER_KG_K * t * C * RHO_0_KG_PER_M3 * supplyPa * Math.sqrt(T0_K / t)) / volumeM3;
  const knee = b * supplyPa;
  let seconds = 0;
  if (startPa < knee) seconds += (Math.min(endPa, knee) - startPa) / rate;
  if (endPa > knee) {
    if (m !== 0.5) throw new RangeError('the subsonic closed form needs subsonicIndex m = 0.5');
    const x = (p: number): number => Math.min(1, (p / supplyPa - b) / (1 - b));
    const from = x(Math.max(startPa, knee));
    seconds += (supplyPa * (1 - b) * (Math.asin(x(endPa)) - Math.asin(from))) / rate;
  }
  return seconds;
}
