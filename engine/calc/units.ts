/**
 * Unit conversions at the edges between the SI document and the UI.
 * Pressures inside the engine are absolute pascals; the UI speaks bar gauge.
 */

import { STANDARD_ATMOSPHERE_PA } from './constants';

/** 1 bar in pascals (exact). */
export const PA_PER_BAR = 100_000;

/** Standard atmosphere, Pa (exact, 10th CGPM 1954); the default ambient pressure. Defined in constants.ts. */
export { STANDARD_ATMOSPHERE_PA };

/** Converts a gauge reading in bar to absolute pascals at the given ambient pressure. */
export function barGaugeToPaAbs(barGauge: number, ambientPa: number = STANDARD_ATMOSPHERE_PA): number {
  return barGauge * PA_PER_BAR + ambientPa;
}

/** Converts absolute pascals to a gauge reading in bar at the given ambient pressure. */
export function paAbsToBarGauge(paAbs: number, ambientPa: number = STANDARD_ATMOSPHERE_PA): number {
  return (paAbs - ambientPa) / PA_PER_BAR;
}

export function mmToM(mm: number): number {
  return mm / 1000;
}

export function mToMm(m: number): number {
  return m * 1000;
}

/** 1 l/min in m³/s. */
export const M3_PER_S_PER_L_PER_MIN = 1 / 60_000;

export function litresPerMinuteToM3PerS(lpm: number): number {
  return lpm * M3_PER_S_PER_L_PER_MIN;
}

export function m3PerSToLitresPerMinute(m3s: number): number {
  return m3s / M3_PER_S_PER_L_PER_MIN;
}
