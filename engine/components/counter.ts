import { terminals } from './electrical-parameters';
import type { ComponentType } from './types';

/**
 * Preset counter: each time its count coil (A1–A2) is energised it counts one; at the
 * preset its contacts (relay contacts naming its tag) operate; energising the reset
 * coil (R1–R2) sets it back to zero and returns them.
 */
export const counter: ComponentType = {
  id: 'counter',
  version: 1,
  label: 'Preset counter',
  category: 'electrical',
  description: 'Counts pulses on A1–A2 and operates its contacts at the preset; R1–R2 resets it.',
  ports: terminals('A1', 'A2', 'R1', 'R2'),
  parameters: {
    preset: { kind: 'number', quantity: 'count', label: 'Preset', default: 3, min: 1, max: 1_000_000, description: 'Count at which the contacts operate.' },
  },
  states: ['counting', 'reached'],
  build(ctx) {
    const control = ctx.control();
    control.addLoad(ctx.terminal('A1'), ctx.terminal('A2'), ctx.componentId, 'count');
    control.addLoad(ctx.terminal('R1'), ctx.terminal('R2'), ctx.componentId, 'reset');
    const preset = Math.round(ctx.num('preset'));
    const tag = ctx.tag;
    let count = 0;
    let pulse = false;
    let resetting = false;
    return {
      onInput(command, api) {
        if (command.action !== 'set') return;
        const on = (command.value ?? 0) > 0;
        if (command.parameter === 'reset') {
          resetting = on;
          if (on && count > 0) {
            const wasReached = count >= preset;
            count = 0;
            api.event('reset');
            if (wasReached) control.operateContacts(tag, false, api);
          }
          return;
        }
        if (on === pulse) return;
        pulse = on;
        if (!on || resetting) return;
        count += 1;
        api.event('counted', String(count));
        if (count === preset) control.operateContacts(tag, true, api);
      },
      signals() {
        return { count, reached: count >= preset ? 1 : 0 };
      },
    };
  },
};
