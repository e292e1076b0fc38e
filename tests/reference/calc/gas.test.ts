import { describe, expect, it } from 'vitest';
import { KAPPA_AIR, R_AIR_J_PER_KG_K, STANDARD_ATMOSPHERE_PA, T0_K } from '@/engine/calc/constants';
import {
  anrVolume,
  fillTimeClosedForm,
  gasDensity,
  gasMass,
  isentropicCompressionPressure,
  isentropicCompressionTemperature,
  isochoricPressure,
  isothermalCompressionPressure,
} from '@/engine/calc/gas';
import { isoMassFlow } from '@/engine/calc/iso6358';
import { barGaugeToPaAbs, paAbsToBarGauge } from '@/engine/calc/units';

describe('ideal gas helpers', () => {
  it('computes mass and density from p, V, T', () => {
    // Ideal gas law p·V = m·R·T (textbook); dry air at 100 kPa, 20 °C: 1.1884 kg/m³ (reference sheet §1.2, derived).
    expect(gasDensity(1e5, T0_K)).toBeCloseTo(1.1884, 4);
    expect(gasMass(7e5, 1e-3, T0_K)).toBeCloseTo((7e5 * 1e-3) / (R_AIR_J_PER_KG_K * T0_K), 15);
  });

  it('turns 1 l at 6 bar gauge into 7.013 25 l (ANR)', () => {
    // Derived in shared reference sheet §2 from V_ANR = V·(p/p0)·(T0/T), p0 = 100 kPa (ISO 8778:2003).
    expect(anrVolume(1, barGaugeToPaAbs(6))).toBeCloseTo(7.01325, 10);
  });

  it('compresses 8:1 isothermally to 7.093 bar gauge', () => {
    // Derived in shared reference sheet §3 from Boyle's law p·V = const, starting at 101 325 Pa.
    const p = isothermalCompressionPressure(STANDARD_ATMOSPHERE_PA, 8);
    expect(p).toBe(810_600);
    expect(paAbsToBarGauge(p)).toBeCloseTo(7.093, 3);
  });

  it('compresses 8:1 isentropically to 1.862 MPa and 673.5 K', () => {
    // Derived in shared reference sheet §3 from p·V^κ = const and T·V^(κ−1) = const with κ = 1.4.
    expect(isentropicCompressionPressure(STANDARD_ATMOSPHERE_PA, 8) / 1e6).toBeCloseTo(1.862, 3);
    expect(isentropicCompressionTemperature(T0_K, 8)).toBeCloseTo(673.5, 1);
  });

  it('heats a rigid vessel at 7 bar abs from 20 °C to 60 °C to 7.955 bar abs', () => {
    // Derived in shared reference sheet §3 from the combined gas law at constant volume.
    expect(isochoricPressure(7e5, 293.15, 333.15) / 1e5).toBeCloseTo(7.955, 3);
  });
});

describe('closed-form fill time', () => {
  const example = { volumeM3: 1e-3, supplyPa: 7e5, startPa: 101_325, endPa: 3e5, C: 1e-8, b: 0.5 };

  it('fills 1 l from 1.013 25 to 3 bar abs in 0.2846 s isothermal and 0.2033 s adiabatic', () => {
    // Derived in shared reference sheet §3.2 (purely choked filling, C = 1 dm³/(s·bar), supply 7 bar abs).
    expect(fillTimeClosedForm({ ...example, n: 1 })).toBeCloseTo(0.2846, 4);
    expect(fillTimeClosedForm({ ...example, n: KAPPA_AIR })).toBeCloseTo(0.2033, 4);
  });

  it('matches a numerical integration of the ISO 6358 flow into the chamber through the subsonic phase', () => {
    // Reference sheet §3.1–3.2: dp/dt = (n·R·T/V)·qm(p_s, p), qm from ISO 6358-1:2013; RK4 as independent check.
    const input = { ...example, endPa: 6.5e5, b: 0.3, n: 1.2 };
    const dpdt = (p: number): number =>
      ((input.n * R_AIR_J_PER_KG_K * T0_K) / input.volumeM3) *
      isoMassFlow({ conductance: input.C, criticalRatio: input.b, upstreamPa: input.supplyPa, downstreamPa: p });
    const h = 1e-5;
    let p = input.startPa;
    let t = 0;
    while (p < input.endPa) {
      const k1 = dpdt(p);
      const k2 = dpdt(p + (h / 2) * k1);
      const k3 = dpdt(p + (h / 2) * k2);
      const k4 = dpdt(p + h * k3);
      const next = p + (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
      if (next >= input.endPa) {
        t += (h * (input.endPa - p)) / (next - p);
        break;
      }
      p = next;
      t += h;
    }
    expect(fillTimeClosedForm(input)).toBeCloseTo(t, 5);
  });

  it('adds up a choked and a subsonic leg', () => {
    // Reference sheet §3.2: total time = choked leg to b·p_s plus subsonic leg from b·p_s.
    const base = { ...example, endPa: 6e5, n: 1 };
    const knee = base.b * base.supplyPa;
    const whole = fillTimeClosedForm(base);
    const legs = fillTimeClosedForm({ ...base, endPa: knee }) + fillTimeClosedForm({ ...base, startPa: knee });
    expect(whole).toBeCloseTo(legs, 12);
  });

  it('refuses inputs outside its derivation', () => {
    expect(() => fillTimeClosedForm({ ...example, endPa: 6e5, n: 1, m: 0.6 })).toThrow(RangeError);
    expect(() => fillTimeClosedForm({ ...example, n: 1.6 })).toThrow(RangeError);
    expect(() => fillTimeClosedForm({ ...example, endPa: 8e5, n: 1 })).toThrow(RangeError);
  });
});
