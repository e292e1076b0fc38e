import { describe, it } from 'vitest';
import { expectValveSteps } from './harness';

describe('valve-5-3-pressurised', () => {
  it('feeds both working lines in the centre; side a feeds 4 and exhausts 2, side b the reverse', () => {
    expectValveSteps('valve-5-3-pressurised', {}, ['2', '4'], [
      { actions: [], position: 1, ports: { '2': 'supply', '4': 'supply' } },
      { actions: [{ action: 'press' }], position: 0, ports: { '2': 'ambient', '4': 'supply' } },
      { actions: [{ action: 'toggle' }], position: 1, ports: { '2': 'supply', '4': 'supply' } },
      { actions: [{ action: 'press', parameter: 'b' }], position: 2, ports: { '2': 'supply', '4': 'ambient' } },
      { actions: [{ action: 'toggle', parameter: 'b' }], position: 1, ports: { '2': 'supply', '4': 'supply' } },
    ]);
  });
});
