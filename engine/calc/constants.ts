/**
 * Physical and reference constants shared by the calc modules and the solver.
 * All values are SI. Provenance follows the shared reference sheet (/work/shared/REFERENCES.md).
 */

/**
 * Specific gas constant of dry air, J/(kg·K).
 * Molar gas constant 8.314 462 618 J/(mol·K) divided by the molar mass of dry air 0.028 964 7 kg/mol
 * gives 287.055; 287.05 is the usual rounded value (reference sheet §10).
 */
export const R_AIR_J_PER_KG_K = 287.05;

/** Ratio of specific heats cp/cv for air near room temperature, dimensionless (textbook value, sheet §10). */
export const KAPPA_AIR = 1.4;

/**
 * Reference density ρ0 of ISO 6358-1:2013, kg/m³ (air at T0 and p0 with 65 % relative humidity).
 * Deliberately a fixed constant: recomputing it from p0/(R·T0) would shift every data-sheet C by about 0.3 %
 * (reference sheet §1.2).
 */
export const RHO_0_KG_PER_M3 = 1.185;

/** Reference temperature T0 = 20 °C in kelvin; ISO 6358-1:2013 and ISO 8778:2003 (ANR). */
export const T0_K = 293.15;

/** Reference pressure of the ISO 8778:2003 standard reference atmosphere (ANR), Pa absolute. */
export const P_ANR_PA = 100_000;

/** Standard atmosphere, Pa (exact, 10th CGPM 1954, Resolution 4). Default ambient pressure. */
export const STANDARD_ATMOSPHERE_PA = 101_325;

/** 0 °C in kelvin (exact, SI definition of the Celsius scale). */
export const ZERO_CELSIUS_K = 273.15;

/** Standard acceleration of gravity, m/s² (exact, 3rd CGPM 1901). */
export const STANDARD_GRAVITY_M_PER_S2 = 9.806_65;
