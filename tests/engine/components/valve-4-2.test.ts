import { describe, it } from 'vitest';
import { expectValveSteps } from './harness';

describe('valve-4-2', () => {
  it('feeds 2 at rest and 4 when pressed, the other line exhausted, and springs back', () => {
    expectValveSteps('valve-4-2', {}, ['2', '4'], [
      { actions: [], position: 1, ports: { '2': 'supply', '4': 'ambient' } },
      { actions: [{ action: 'press' }], position: 0, ports: { '2': 'ambient', '4': 'supply' } },
      { actions: [{ action: 'release' }], position: 1, ports: { '2': 'supply', '4': 'ambient' } },
    ]);
  });
});
