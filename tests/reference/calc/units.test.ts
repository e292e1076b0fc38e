import { describe, expect, it } from 'vitest';
import {
  barGaugeToPaAbs,
  litresPerMinuteToM3PerS,
  m3PerSToLitresPerMinute,
  mmToM,
  paAbsToBarGauge,
  STANDARD_ATMOSPHERE_PA,
} from '@/engine/calc/units';

describe('unit conversions at the UI edge', () => {
  it('uses the standard atmosphere of 101 325 Pa', () => {
    // Source: 10th CGPM (1954), Resolution 4: 1 atm = 101 325 Pa exactly.
    expect(STANDARD_ATMOSPHERE_PA).toBe(101_325);
  });

  it('turns 7 bar gauge into about 8 bar absolute', () => {
    // Common practice: "7 bar gauge ≈ 8 bar absolute"; exactly 8.013 25 bar with 1 bar = 100 kPa (SI brochure).
    const abs = barGaugeToPaAbs(7);
    expect(abs).toBe(801_325);
    expect(abs / 1e5).toBeCloseTo(8, 1);
  });

  it('round-trips gauge and absolute at a non-standard ambient', () => {
    expect(paAbsToBarGauge(barGaugeToPaAbs(6.3, 95_000), 95_000)).toBeCloseTo(6.3, 12);
    expect(paAbsToBarGauge(95_000, 95_000)).toBe(0);
  });

  it('converts flow and length', () => {
    // 1 l/min = 1.6667 × 10⁻⁵ m³/s (arithmetic: 10⁻³ m³ / 60 s).
    expect(litresPerMinuteToM3PerS(1)).toBeCloseTo(1.6667e-5, 9);
    expect(m3PerSToLitresPerMinute(litresPerMinuteToM3PerS(500))).toBeCloseTo(500, 10);
    expect(mmToM(50)).toBe(0.05);
  });
});
