import { describe, expect, it } from 'vitest';
import {
  KAPPA_AIR,
  P_ANR_PA,
  R_AIR_J_PER_KG_K,
  RHO_0_KG_PER_M3,
  STANDARD_ATMOSPHERE_PA,
  STANDARD_GRAVITY_M_PER_S2,
  T0_K,
  ZERO_CELSIUS_K,
} from '@/engine/calc/constants';
import { STANDARD_ATMOSPHERE_PA as UNITS_ATMOSPHERE } from '@/engine/calc/units';

describe('physical and reference constants', () => {
  it('uses the exact SI-defined constants', () => {
    // Source: 10th CGPM (1954), Resolution 4: 1 atm = 101 325 Pa exactly.
    expect(STANDARD_ATMOSPHERE_PA).toBe(101_325);
    // units.ts re-exports the same value (no second definition).
    expect(UNITS_ATMOSPHERE).toBe(STANDARD_ATMOSPHERE_PA);
    // Source: 3rd CGPM (1901): standard gravity 9.806 65 m/s².
    expect(STANDARD_GRAVITY_M_PER_S2).toBe(9.806_65);
    // Source: SI brochure, definition of the Celsius temperature: 0 °C = 273.15 K.
    expect(ZERO_CELSIUS_K).toBe(273.15);
  });

  it('uses the ISO 6358-1 / ISO 8778 reference state', () => {
    // Source: ISO 8778:2003 standard reference atmosphere: 20 °C, 100 kPa (reference sheet §2, from memory there).
    expect(T0_K).toBe(ZERO_CELSIUS_K + 20);
    expect(P_ANR_PA).toBe(100_000);
    // Source: ISO 6358-1:2013 reference density ρ0 = 1.185 kg/m³ (reference sheet §1.2, secondary sources).
    expect(RHO_0_KG_PER_M3).toBe(1.185);
  });

  it('keeps ρ0 distinct from the dry-air density at p0 and T0', () => {
    // Derived in shared reference sheet §1.2 from p0/(R·T0): dry air gives 1.1884 kg/m³, about 0.3 % above ρ0.
    const dry = P_ANR_PA / (R_AIR_J_PER_KG_K * T0_K);
    expect(dry).toBeCloseTo(1.1884, 4);
    expect(dry / RHO_0_KG_PER_M3 - 1).toBeCloseTo(0.0029, 3);
  });

  it('has gas properties consistent with the speed of sound in air', () => {
    // Source: R = 8.314 462 618 / 0.028 964 7 J/(kg·K) (CODATA molar gas constant, molar mass of dry air, from memory).
    // Reference sheet §10: values 287.05–287.06 differ by less than 0.003 %.
    expect(Math.abs(R_AIR_J_PER_KG_K / (8.314_462_618 / 0.028_964_7) - 1)).toBeLessThan(3e-5);
    // Textbook value κ = 1.4 for air.
    expect(KAPPA_AIR).toBe(1.4);
    // Derived in shared reference sheet §10 from a = √(κRT): 343.2 m/s at 20 °C.
    expect(Math.sqrt(KAPPA_AIR * R_AIR_J_PER_KG_K * T0_K)).toBeCloseTo(343.2, 1);
  });
});
