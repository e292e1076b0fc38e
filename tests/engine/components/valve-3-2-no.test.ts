import { describe, it } from 'vitest';
import { expectValveSteps } from './harness';

describe('valve-3-2-no', () => {
  it('feeds 2 at rest, exhausts 2 when pressed, and springs back on release', () => {
    expectValveSteps('valve-3-2-no', {}, ['2'], [
      { actions: [], position: 1, ports: { '2': 'supply' } },
      { actions: [{ action: 'press' }], position: 0, ports: { '2': 'ambient' } },
      { actions: [{ action: 'release' }], position: 1, ports: { '2': 'supply' } },
    ]);
  });
});
