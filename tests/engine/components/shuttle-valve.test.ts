import { describe, expect, it } from 'vitest';
import { BOTH_INPUT_COMBINATIONS, logicValveOutput, logicValveTrace, portBar, valueAt } from './harness';

describe('shuttle-valve', () => {
  const layouts: Array<readonly [number, number]> = [
    [6, 4],
    [4, 6],
  ];
  for (const pressures of layouts) {
    for (const supplied of BOTH_INPUT_COMBINATIONS) {
      const active = pressures.filter((_, i) => supplied[i]);
      const expected = active.length ? Math.max(...active) : 0;
      const name = `inputs at ${pressures[0]} / ${pressures[1]} bar, supplied ${supplied.map((s) => (s ? 'yes' : 'no')).join(' / ')}: output at ${expected} bar`;
      it(name, () => {
        const out = logicValveOutput('shuttle-valve', pressures, supplied);
        expect(Math.abs(out - expected)).toBeLessThan(0.05);
      });
    }
  }
  it('falls back to the other input when the higher one is exhausted', () => {
    const trace = logicValveTrace(
      'shuttle-valve',
      [6, 4],
      [
        { t: 0.05, component: 'p1', action: 'press' },
        { t: 0.05, component: 'p2', action: 'press' },
        { t: 0.65, component: 'p1', action: 'release' },
      ],
      1.3,
    );
    expect(Math.abs(portBar(trace, 'lv', '2', 0.6) - 6)).toBeLessThan(0.05);
    expect(Math.abs(portBar(trace, 'lv', '2', 1.25) - 4)).toBeLessThan(0.05);
    expect(valueAt(trace, 'lv:joined', 1.25)).toBe(2);
  });
});
