import { describe, expect, it } from 'vitest';
import {
  airConsumptionLitresPerMinute,
  annulusArea,
  effectiveForce,
  extendForce,
  freeAirPerDoubleStroke,
  freeAirPerStroke,
  netRodForce,
  pistonArea,
  retractForce,
  rodArea,
} from '@/engine/calc/cylinder';
import { tubeVolume } from '@/engine/calc/tube';
import { barGaugeToPaAbs } from '@/engine/calc/units';

const SIX_BAR_GAUGE_PA = 6e5;

describe('cylinder areas', () => {
  it('computes piston, rod and annulus areas', () => {
    // Geometry: A = π·D²/4. 50 mm bore → 1963.50 mm², 20 mm rod → 314.16 mm².
    expect(pistonArea(0.05) * 1e6).toBeCloseTo(1963.495, 3);
    expect(rodArea(0.02) * 1e6).toBeCloseTo(314.159, 3);
    expect(annulusArea(0.05, 0.02)).toBeCloseTo(pistonArea(0.05) - rodArea(0.02), 15);
  });

  it('rejects impossible geometry', () => {
    expect(() => annulusArea(0.02, 0.02)).toThrow(RangeError);
    expect(() => pistonArea(0)).toThrow(RangeError);
  });
});

describe('cylinder force at 6 bar gauge', () => {
  // Derived in shared reference sheet §4.1 from F = p_g·A and F = p_g·(A − a); bore/rod pairs per ISO 6432 / ISO 15552.
  const table: Array<[number, number, number, number]> = [
    [25, 10, 294.5, 247.4],
    [32, 12, 482.5, 414.7],
    [50, 20, 1178.1, 989.6],
    [63, 20, 1870.3, 1681.9],
    [100, 25, 4712.4, 4417.9],
  ];

  it.each(table)('bore %i / rod %i mm gives the tabulated extend and retract forces', (bore, rod, ext, ret) => {
    expect(extendForce(bore / 1000, SIX_BAR_GAUGE_PA)).toBeCloseTo(ext, 1);
    expect(retractForce(bore / 1000, rod / 1000, SIX_BAR_GAUGE_PA)).toBeCloseTo(ret, 1);
  });

  it('agrees with the absolute-pressure balance when the rod end sees ambient', () => {
    // Derived in shared reference sheet §4.1 (statics): p_A·A − p_B·(A − a) − p_amb·a = p_A,g·A − p_B,g·(A − a).
    const ambient = 98_000;
    const capPa = barGaugeToPaAbs(6, ambient);
    const rodPa = barGaugeToPaAbs(2, ambient);
    const gaugeForm = extendForce(0.05, 6e5) - retractForce(0.05, 0.02, 2e5);
    expect(netRodForce(0.05, 0.02, capPa, rodPa, ambient)).toBeCloseTo(gaugeForm, 8);
    // Both chambers at supply (pressure-centre 5/3 valve): net outward force p_g·a (reference sheet §6.3).
    expect(netRodForce(0.05, 0.02, capPa, capPa, ambient)).toBeCloseTo(6e5 * rodArea(0.02), 8);
  });

  it('applies the efficiency as a plain factor', () => {
    // Reference sheet §4.1: η is a parameter (trade practice 0.85–0.95); the test checks the multiplication only.
    expect(effectiveForce(1000, 0.9)).toBeCloseTo(900, 12);
    expect(() => effectiveForce(1000, 0)).toThrow(RangeError);
    expect(() => effectiveForce(1000, 1.2)).toThrow(RangeError);
  });
});

describe('free-air consumption', () => {
  const cyl5020 = { boreM: 0.05, rodM: 0.02, strokeM: 0.1, gaugePa: SIX_BAR_GAUGE_PA };

  it('gives 2.5338 l (ANR) and 2.5006 l at ambient for 50/20 × 100 mm at 6 bar', () => {
    // Derived in shared reference sheet §4.2 from V_free = [A·s + (A − a)·s]·(p_g + p_amb)/p_ref.
    expect(freeAirPerDoubleStroke(cyl5020)).toBeCloseTo(2.5338, 4);
    expect(freeAirPerDoubleStroke({ ...cyl5020, reference: 'ambient' })).toBeCloseTo(2.5006, 4);
  });

  it('gives 1.0350 l at ambient for 32/12 × 100 mm', () => {
    // Derived in shared reference sheet §4.2 (free air at ambient, 6 bar gauge).
    const v = freeAirPerDoubleStroke({ boreM: 0.032, rodM: 0.012, strokeM: 0.1, gaugePa: 6e5, reference: 'ambient' });
    expect(v).toBeCloseTo(1.035, 4);
  });

  it('gives 81.96 l/min at ambient for 63/20 × 200 mm at 10 cycles/min', () => {
    // Derived in shared reference sheet §4.2: Q = V_free × double strokes per minute (free air at ambient, 6 bar).
    const input = { boreM: 0.063, rodM: 0.02, strokeM: 0.2, gaugePa: 6e5, reference: 'ambient' as const };
    expect(airConsumptionLitresPerMinute(input, 10)).toBeCloseTo(81.96, 2);
  });

  it('splits a double stroke into extend and retract strokes', () => {
    const ext = freeAirPerStroke(cyl5020, 'extend');
    const ret = freeAirPerStroke(cyl5020, 'retract');
    expect(ext + ret).toBeCloseTo(freeAirPerDoubleStroke(cyl5020), 12);
    // Ratio of swept volumes = A/(A − a) = 2500/2100 (geometry).
    expect(ext / ret).toBeCloseTo(2500 / 2100, 12);
  });

  it('adds the dead volume charged from the start pressure', () => {
    // Reference sheet §4.2: dead volume adds V_dead·(p_g + p_amb − p_start)/p_ref; from ambient that is V_dead·p_g/p_ref.
    const dead = tubeVolume(2, 0.004);
    const withDead = freeAirPerStroke({ ...cyl5020, capDeadVolumeM3: dead }, 'extend');
    const extra = (dead * 6e5) / 1e5; // m³ ANR
    expect(withDead - freeAirPerStroke(cyl5020, 'extend')).toBeCloseTo(extra * 1000, 10);
    // Retract stroke is unaffected by the cap-side dead volume.
    expect(freeAirPerStroke({ ...cyl5020, capDeadVolumeM3: dead }, 'retract')).toBe(
      freeAirPerStroke(cyl5020, 'retract'),
    );
  });

  it('corrects ANR volumes for a chamber temperature other than 20 °C', () => {
    // Reference sheet §2: V_ANR = V·(p/p0)·(T0/T).
    const warm = freeAirPerDoubleStroke({ ...cyl5020, temperatureK: 313.15 });
    expect(warm).toBeCloseTo((2.5338 * 293.15) / 313.15, 3);
  });
});
