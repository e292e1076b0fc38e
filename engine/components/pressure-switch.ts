import { stuckInput, terminals, type StuckState } from './electrical-parameters';
import type { ComponentType, RuntimeApi } from './types';

/**
 * Pressure switch: a pneumatic sensing port and a changeover contact that operates above a set gauge pressure.
 * A failure can be given as an input: `set` `stuck` 1 (stuck on), 0 (stuck off), -1 (working again).
 */
export const pressureSwitch: ComponentType = {
  id: 'pressure-switch',
  version: 1,
  label: 'Pressure switch',
  category: 'electrical',
  description: 'Changeover contact (11 common, 12 NC, 14 NO) that operates when the air at port 1 exceeds the set pressure.',
  ports: [{ id: '1', role: 'signal' }, ...terminals('11', '12', '14')],
  parameters: {
    setPressure: { kind: 'number', quantity: 'pressure-gauge', label: 'Switching pressure', default: 400_000, min: 10_000, max: 1_600_000, description: 'Gauge pressure at which the contact operates on rising pressure.' },
    hysteresis: { kind: 'number', quantity: 'pressure-difference', label: 'Hysteresis', default: 50_000, min: 0, max: 500_000, description: 'How far below the switching pressure it must fall to release.' },
  },
  states: ['released', 'operated'],
  inputs: ['set'],
  build(ctx) {
    const control = ctx.control();
    const sense = ctx.port('1');
    const nc = control.addContact(ctx.terminal('11'), ctx.terminal('12'), true, ctx.componentId);
    const no = control.addContact(ctx.terminal('11'), ctx.terminal('14'), false, ctx.componentId);
    const set = ctx.num('setPressure');
    const hysteresis = ctx.num('hysteresis');
    // What the pressure calls for, kept apart from the output so that a stuck switch still tracks its hysteresis.
    let sensed = false;
    let stuck: StuckState = null;
    let operated = false;
    const margin = (api: RuntimeApi) => api.pressure(sense) - api.ambientPa() - (sensed ? set - hysteresis : set);
    const apply = (api: RuntimeApi) => {
      sensed = margin(api) > 0 ? true : sensed && margin(api) >= 0;
      const now = stuck ?? sensed;
      if (now === operated) return;
      operated = now;
      api.event(operated ? 'operated' : 'released');
      control.setContacts([[nc, !operated], [no, operated]], api);
    };
    const guardValues = [0];
    return {
      guards(api) {
        guardValues[0] = margin(api);
        return guardValues;
      },
      onGuard: (_i, _rising, api) => apply(api),
      start: apply,
      onInput(command, api) {
        const next = stuckInput(command, api);
        if (next === undefined) return;
        stuck = next;
        apply(api);
      },
      signals: () => ({ operated: operated ? 1 : 0 }),
    };
  },
};
