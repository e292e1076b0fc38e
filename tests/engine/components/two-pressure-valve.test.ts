import { describe, expect, it } from 'vitest';
import { BOTH_INPUT_COMBINATIONS, logicValveOutput, logicValveTrace, portBar } from './harness';

describe('two-pressure-valve', () => {
  // Both ways round, so neither input is favoured: [pressure on 1.1, pressure on 1.2], bar gauge.
  const layouts: Array<readonly [number, number]> = [
    [6, 4],
    [4, 6],
  ];
  for (const pressures of layouts) {
    for (const supplied of BOTH_INPUT_COMBINATIONS) {
      const both = supplied[0] && supplied[1];
      const name = `inputs at ${pressures[0]} / ${pressures[1]} bar, supplied ${supplied.map((s) => (s ? 'yes' : 'no')).join(' / ')}: output ${both ? 'at the lower input pressure' : 'exhausted'}`;
      it(name, () => {
        const out = logicValveOutput('two-pressure-valve', pressures, supplied);
        const expected = both ? Math.min(...pressures) : 0;
        expect(Math.abs(out - expected)).toBeLessThan(0.05);
      });
    }
  }
  it('exhausts the output as soon as one input goes, whichever it is', () => {
    for (const gone of ['p1', 'p2']) {
      const trace = logicValveTrace(
        'two-pressure-valve',
        [6, 4],
        [
          { t: 0.05, component: 'p1', action: 'press' },
          { t: 0.05, component: 'p2', action: 'press' },
          { t: 0.65, component: gone, action: 'release' },
        ],
        1.3,
      );
      expect(Math.abs(portBar(trace, 'lv', '2', 0.6) - 4)).toBeLessThan(0.05);
      expect(portBar(trace, 'lv', '2', 1.25)).toBeLessThan(0.05);
    }
  });
});
