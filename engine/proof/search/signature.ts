import type { SignalUnit, Trace } from '../../trace/trace';

/**
 * Grid each quantity is rounded to before two states are compared: discrete states exactly,
 * positions to 1 mm, velocities to 10 mm/s, pressures to 0.1 bar (in SI units). Passage flows are
 * left out: they follow from the pressures and the valve positions.
 */
const GRID: Readonly<Partial<Record<SignalUnit, number>>> = { m: 0.001, 'm/s': 0.01, Pa: 10_000 };

/** The trace's row at time t (the last row at or before it). */
export function rowAt(trace: Trace, t: number): number {
  const k = Math.floor(t / trace.intervalS + 1e-6);
  return Math.max(0, Math.min(k, trace.time.length - 1));
}

/** The physical state of a run at time t, rounded to the grid, as one string. */
export function signState(trace: Trace, t: number): string {
  const k = rowAt(trace, t);
  const parts: string[] = [];
  for (const s of trace.signals) {
    if (s.unit === 'kg/s') continue;
    const value = s.values[k]!;
    const grid = GRID[s.unit];
    // `+ 0` turns a rounded -0 into 0, so that the two sign alike.
    parts.push(String((grid ? Math.round(value / grid) : value) + 0));
  }
  return parts.join(',');
}
