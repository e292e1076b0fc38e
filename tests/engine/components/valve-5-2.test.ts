import { describe, expect, it } from 'vitest';
import { signal } from '@/engine/trace/trace';
import { TestCircuit } from '../support/circuit';
import { expectValveSteps, pushbutton, runCircuit, type ValveStep } from './harness';

/** The valve piloted from two pushbutton 3/2 valves: `pa` on pilot 14 (side a), `pb` on pilot 12 (side b). */
function expectPilotSteps(parameters: Record<string, string>, steps: ValveStep[]): void {
  expectValveSteps('valve-5-2', parameters, ['2', '4'], steps, (c) => pushbutton(pushbutton(c, 'pa', 'sup:2'), 'pb', 'sup:2').tube('pa:2', 'v:14').tube('pb:2', 'v:12'));
}

describe('valve-5-2', () => {
  it('feeds 2 at rest and 4 when pressed, the other line exhausted, and springs back', () => {
    expectValveSteps('valve-5-2', {}, ['2', '4'], [
      { actions: [], position: 1, ports: { '2': 'supply', '4': 'ambient' } },
      { actions: [{ action: 'press' }], position: 0, ports: { '2': 'ambient', '4': 'supply' } },
      { actions: [{ action: 'release' }], position: 1, ports: { '2': 'supply', '4': 'ambient' } },
    ]);
  });

  it('with a detented lever: stays where it is put and is moved back by the same lever (side b)', () => {
    expectValveSteps('valve-5-2', { actuation: 'lever-detent', returnBy: 'detent' }, ['2', '4'], [
      { actions: [], position: 1, ports: { '2': 'supply', '4': 'ambient' } },
      { actions: [{ action: 'press' }], position: 0, ports: { '2': 'ambient', '4': 'supply' } },
      { actions: [{ action: 'release' }], position: 0, ports: { '2': 'ambient', '4': 'supply' } },
      { actions: [{ action: 'press', parameter: 'b' }], position: 1, ports: { '2': 'supply', '4': 'ambient' } },
      { actions: [{ action: 'release', parameter: 'b' }], position: 1, ports: { '2': 'supply', '4': 'ambient' } },
      { actions: [{ action: 'press' }], position: 0, ports: { '2': 'ambient', '4': 'supply' } },
    ]);
  });

  it('with pilot and spring return: follows pilot 14 and springs back when it is vented', () => {
    // Pilot 14 fed from pushbutton valve `pa`.
    expectPilotSteps({ actuation: 'pilot', returnBy: 'spring' }, [
      { actions: [], position: 1, ports: { '2': 'supply', '4': 'ambient' } },
      { actions: [{ component: 'pa', action: 'press' }], position: 0, ports: { '2': 'ambient', '4': 'supply' } },
      { actions: [{ component: 'pa', action: 'release' }], position: 1, ports: { '2': 'supply', '4': 'ambient' } },
    ]);
  });

  it('with double pilots: keeps its last position when both pilots are vented (memory)', () => {
    expectPilotSteps({ actuation: 'pilot', returnBy: 'pilot' }, [
      { actions: [], position: 1, ports: { '2': 'supply', '4': 'ambient' } },
      { actions: [{ component: 'pa', action: 'press' }], position: 0, ports: { '2': 'ambient', '4': 'supply' } },
      { actions: [{ component: 'pa', action: 'release' }], position: 0, ports: { '2': 'ambient', '4': 'supply' } },
      { actions: [{ component: 'pb', action: 'press' }], position: 1, ports: { '2': 'supply', '4': 'ambient' } },
      { actions: [{ component: 'pb', action: 'release' }], position: 1, ports: { '2': 'supply', '4': 'ambient' } },
    ]);
  });

  it('with double solenoids: keeps its last position when both coils are off (memory)', () => {
    expectValveSteps('valve-5-2', { actuation: 'solenoid', returnBy: 'solenoid' }, ['2', '4'], [
      { actions: [], position: 1, ports: { '2': 'supply', '4': 'ambient' } },
      { actions: [{ action: 'set', value: 1 }], position: 0, ports: { '2': 'ambient', '4': 'supply' } },
      { actions: [{ action: 'set', value: 0 }], position: 0, ports: { '2': 'ambient', '4': 'supply' } },
      { actions: [{ action: 'set', parameter: 'b', value: 1 }], position: 1, ports: { '2': 'supply', '4': 'ambient' } },
      { actions: [{ action: 'set', parameter: 'b', value: 0 }], position: 1, ports: { '2': 'supply', '4': 'ambient' } },
    ]);
  });
});

describe('valve-5-2 solenoid manual override', () => {
  it('moves on a press only when the manual override is fitted', () => {
    const positionAfterPress = (manualOverride: boolean) => {
      const doc = new TestCircuit()
        .add('s', 'air-supply')
        .add('v', 'valve-5-2', { actuation: 'solenoid', manualOverride })
        .tube('s:2', 'v:1')
        .build();
      const trace = runCircuit(doc, [{ t: 0.1, component: 'v', action: 'press' }], 0.3);
      return signal(trace, 'v:position')!.values.at(-1);
    };
    expect(positionAfterPress(true)).toBe(0);
    expect(positionAfterPress(false)).toBe(1);
  });
});
