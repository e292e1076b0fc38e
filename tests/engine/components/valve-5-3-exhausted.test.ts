import { describe, it } from 'vitest';
import { expectValveSteps } from './harness';

describe('valve-5-3-exhausted', () => {
  it('exhausts both working lines in the centre; side a feeds 4, side b feeds 2', () => {
    // Default actuation is a detented lever: a press moves it to that side and it stays there; pressing the same side again (toggle) brings it back.
    expectValveSteps('valve-5-3-exhausted', {}, ['2', '4'], [
      { actions: [], position: 1, ports: { '2': 'ambient', '4': 'ambient' } },
      { actions: [{ action: 'press' }], position: 0, ports: { '2': 'ambient', '4': 'supply' } },
      { actions: [{ action: 'toggle' }], position: 1, ports: { '2': 'ambient', '4': 'ambient' } },
      { actions: [{ action: 'press', parameter: 'b' }], position: 2, ports: { '2': 'supply', '4': 'ambient' } },
      { actions: [{ action: 'toggle', parameter: 'b' }], position: 1, ports: { '2': 'ambient', '4': 'ambient' } },
    ]);
  });

  it('with pushbuttons: springs back to the exhausted centre on release', () => {
    expectValveSteps('valve-5-3-exhausted', { actuation: 'pushbutton' }, ['2', '4'], [
      { actions: [{ action: 'press', parameter: 'b' }], position: 2, ports: { '2': 'supply', '4': 'ambient' } },
      { actions: [{ action: 'release', parameter: 'b' }], position: 1, ports: { '2': 'ambient', '4': 'ambient' } },
    ]);
  });
});
