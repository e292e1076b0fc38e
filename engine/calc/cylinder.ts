/**
 * Single-rod cylinder sizing: areas, forces and free-air consumption.
 * Lengths in metres, areas m², pressures Pa (gauge or absolute as named), forces N, volumes litres where named.
 * Formulas: statics and ideal-gas bookkeeping as collected in the reference sheet §4.
 */

import { P_ANR_PA, STANDARD_ATMOSPHERE_PA, T0_K } from './constants';

function circleArea(diameterM: number): number {
  return (Math.PI * diameterM * diameterM) / 4;
}

function checkBoreRod(boreM: number, rodM: number): void {
  if (!(boreM > 0)) throw new RangeError(`boreM must be > 0, got ${boreM}`);
  if (!(rodM >= 0 && rodM < boreM)) throw new RangeError(`rodM must satisfy 0 ≤ rod < bore, got ${rodM}`);
}

/** Piston (cap-side) area A = π·D²/4, m². */
export function pistonArea(boreM: number): number {
  if (!(boreM > 0)) throw new RangeError(`boreM must be > 0, got ${boreM}`);
  return circleArea(boreM);
}

/** Rod cross-section a = π·d²/4, m². */
export function rodArea(rodM: number): number {
  if (!(rodM >= 0)) throw new RangeError(`rodM must be ≥ 0, got ${rodM}`);
  return circleArea(rodM);
}

/** Annulus (rod-side) area A − a = π·(D² − d²)/4, m². */
export function annulusArea(boreM: number, rodM: number): number {
  checkBoreRod(boreM, rodM);
  return circleArea(boreM) - circleArea(rodM);
}

/** Theoretical extending force, N: F = p_gauge·A (reference sheet §4.1). */
export function extendForce(boreM: number, gaugePa: number): number {
  return gaugePa * pistonArea(boreM);
}

/** Theoretical retracting force, N: F = p_gauge·(A − a) (reference sheet §4.1). */
export function retractForce(boreM: number, rodM: number, gaugePa: number): number {
  return gaugePa * annulusArea(boreM, rodM);
}

/**
 * Net rod force from absolute chamber pressures, N, positive outward:
 * F = p_cap·A − p_rod·(A − a) − p_amb·a (static balance; reference sheet §4.1). Equals the gauge form
 * p_cap,g·A − p_rod,g·(A − a) when the rod's outer end is at ambient pressure.
 */
export function netRodForce(
  boreM: number,
  rodM: number,
  capPa: number,
  rodSidePa: number,
  ambientPa: number = STANDARD_ATMOSPHERE_PA,
): number {
  return capPa * pistonArea(boreM) - rodSidePa * annulusArea(boreM, rodM) - ambientPa * rodArea(rodM);
}

/**
 * Effective force, N: η·F_theoretical. η (0 < η ≤ 1) is an input: sizing factors of 0.85–0.95 are trade
 * practice, not a standard value (reference sheet §4.1).
 */
export function effectiveForce(theoreticalN: number, efficiency: number): number {
  if (!(efficiency > 0 && efficiency <= 1)) throw new RangeError(`efficiency must satisfy 0 < η ≤ 1, got ${efficiency}`);
  return efficiency * theoreticalN;
}

/**
 * Reference state of a free-air volume:
 * - `'anr'`: ISO 8778:2003, 100 kPa and 293.15 K (litres ANR);
 * - `'ambient'`: free air at the given ambient pressure and the working temperature.
 */
export type FreeAirReference = 'anr' | 'ambient';

/** Cylinder and supply data for consumption estimates. */
export interface ConsumptionInput {
  boreM: number;
  rodM: number;
  strokeM: number;
  /** Working (supply) pressure, Pa gauge. */
  gaugePa: number;
  /** Ambient pressure, Pa absolute. Defaults to 101 325 Pa. */
  ambientPa?: number;
  /** Reference state of the result. Defaults to `'anr'`. */
  reference?: FreeAirReference;
  /** Air temperature in the chambers, K (isothermal end state). Used for ANR only. Defaults to 293.15 K. */
  temperatureK?: number;
  /** Cap-side dead volume (ports, tubing), m³. Defaults to 0. */
  capDeadVolumeM3?: number;
  /** Rod-side dead volume (ports, tubing), m³. Defaults to 0. */
  rodDeadVolumeM3?: number;
  /** Chamber pressure before filling, Pa absolute. Defaults to ambient (chamber fully exhausted). */
  startPa?: number;
}

/** Stroke direction: extending fills the cap side, retracting fills the rod side. */
export type StrokeDirection = 'extend' | 'retract';

/**
 * Free air used by one stroke, litres (ANR or at ambient, per `reference`):
 * V_free = [V_swept·p_abs + V_dead·(p_abs − p_start)]/p_ref, times T0/T for ANR, with p_abs = p_g + p_amb.
 * Isothermal end state (handbook formula, reference sheet §4.2).
 */
export function freeAirPerStroke(input: ConsumptionInput, direction: StrokeDirection): number {
  const ambientPa = input.ambientPa ?? STANDARD_ATMOSPHERE_PA;
  const startPa = input.startPa ?? ambientPa;
  const temperatureK = input.temperatureK ?? T0_K;
  if (!(input.strokeM >= 0)) throw new RangeError(`strokeM must be ≥ 0, got ${input.strokeM}`);
  if (!(temperatureK > 0)) throw new RangeError(`temperatureK must be > 0, got ${temperatureK}`);
  const extend = direction === 'extend';
  const area = extend ? pistonArea(input.boreM) : annulusArea(input.boreM, input.rodM);
  checkBoreRod(input.boreM, input.rodM);
  const dead = (extend ? input.capDeadVolumeM3 : input.rodDeadVolumeM3) ?? 0;
  const pAbs = input.gaugePa + ambientPa;
  const pressureVolume = area * input.strokeM * pAbs + dead * (pAbs - startPa);
  const anr = (input.reference ?? 'anr') === 'anr';
  const m3 = anr ? (pressureVolume / P_ANR_PA) * (T0_K / temperatureK) : pressureVolume / ambientPa;
  return m3 * 1000;
}

/** Free air used by one double stroke (extend + retract), litres (reference sheet §4.2). */
export function freeAirPerDoubleStroke(input: ConsumptionInput): number {
  return freeAirPerStroke(input, 'extend') + freeAirPerStroke(input, 'retract');
}

/** Free-air consumption rate, l/min: V_free per double stroke × double strokes per minute (reference sheet §4.2). */
export function airConsumptionLitresPerMinute(input: ConsumptionInput, cyclesPerMinute: number): number {
  if (!(cyclesPerMinute >= 0)) throw new RangeError(`cyclesPerMinute must be ≥ 0, got ${cyclesPerMinute}`);
  return freeAirPerDoubleStroke(input) * cyclesPerMinute;
}
