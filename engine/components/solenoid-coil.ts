import { switchedLoad, terminals } from './electrical-parameters';
import type { ComponentType } from './types';

/**
 * Valve solenoid coil (1M1, 1M2 …) on the electrical side: while energised it drives the
 * solenoid on side 14 or 12 of the valve whose tag it names; the valve then switches after
 * its own switching time.
 */
export const solenoidCoil: ComponentType = {
  id: 'solenoid-coil',
  version: 1,
  label: 'Solenoid coil',
  category: 'electrical',
  description: 'Coil of a valve solenoid, drawn in the control circuit and bound to its valve by tag.',
  ports: terminals('A1', 'A2'),
  parameters: {
    valve: { kind: 'tag', refers: 'valve', label: 'Valve', default: '1V1', description: 'Tag of the solenoid valve this coil actuates.' },
    side: { kind: 'choice', label: 'Valve side', options: ['14', '12'], default: '14', description: 'Pilot side the solenoid sits on: 14 shifts to the a position, 12 to the b position.' },
  },
  states: ['de-energised', 'energised'],
  build(ctx) {
    const control = ctx.control();
    control.addLoad(ctx.terminal('A1'), ctx.terminal('A2'), ctx.componentId);
    const valve = ctx.choice('valve');
    const side = ctx.choice('side') === '12' ? 'b' : 'a';
    let energised = false;
    return {
      onInput(command, api) {
        const now = switchedLoad(command, energised);
        if (now === null) return;
        energised = now;
        api.event(energised ? 'energised' : 'de-energised');
        api.send(valve, { action: 'set', parameter: side, value: energised ? 1 : 0 });
      },
      signals() {
        return { energised: energised ? 1 : 0 };
      },
    };
  },
};
