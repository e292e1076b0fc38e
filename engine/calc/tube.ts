/**
 * Tube geometry. Lengths in metres, volumes in m³.
 */

/**
 * Internal volume of a straight tube, m³: V = L·π·ID²/4 (geometry; reference sheet §5.1).
 * Used as dead volume for consumption estimates and as a lumped volume by the solver.
 */
export function tubeVolume(lengthM: number, innerDiameterM: number): number {
  if (!(lengthM >= 0)) throw new RangeError(`lengthM must be ≥ 0, got ${lengthM}`);
  if (!(innerDiameterM >= 0)) throw new RangeError(`innerDiameterM must be ≥ 0, got ${innerDiameterM}`);
  return (lengthM * Math.PI * innerDiameterM * innerDiameterM) / 4;
}
