import { describe, expect, it } from 'vitest';
import { rampColour, rampTopBar } from '@/components/editor/run/pressure-ramp';

const luminance = (hex: string) => {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255);
  return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!;
};

describe('pressure ramp', () => {
  it('runs from dark blue at atmospheric to yellow at full pressure, clamped outside', () => {
    expect(rampColour(0)).toBe('#00204d');
    expect(rampColour(1)).toBe('#ffea46');
    expect(rampColour(-3)).toBe('#00204d');
    expect(rampColour(7)).toBe('#ffea46');
    expect(rampColour(Number.NaN)).toBe('#00204d');
  });

  it('gets lighter all the way, so pressure reads as lightness even without colour vision', () => {
    const steps = Array.from({ length: 21 }, (_, i) => luminance(rampColour(i / 20)));
    for (let i = 1; i < steps.length; i += 1) expect(steps[i]!).toBeGreaterThan(steps[i - 1]!);
  });

  it('tops out at the highest pressure of the run rounded up to a whole bar, at least 1 bar', () => {
    expect(rampTopBar(5.98)).toBe(6);
    expect(rampTopBar(6)).toBe(6);
    expect(rampTopBar(0.2)).toBe(1);
  });
});
