import { describe, it } from 'vitest';
import { expectValveSteps } from './harness';

describe('valve-2-2', () => {
  it('blocks at rest, joins 1 to 2 when pressed, and blocks again (holding the line) on release', () => {
    expectValveSteps('valve-2-2', {}, ['2'], [
      { actions: [], position: 1, ports: { '2': 'ambient' } },
      { actions: [{ action: 'press' }], position: 0, ports: { '2': 'supply' } },
      // Closed again: no exhaust passage, so the line keeps its air …
      { actions: [{ action: 'release' }], position: 1, ports: { '2': 'supply' } },
      // … even when the supply behind the valve is lost.
      { actions: [{ component: 'sup', action: 'set', value: 0 }], position: 1, ports: { '2': 'supply' } },
    ]);
  });
});
