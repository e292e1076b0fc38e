import { terminals } from './electrical-parameters';
import type { ComponentType, RuntimeApi } from './types';

/** Pressure switch: a pneumatic sensing port and a changeover contact that operates above a set gauge pressure. */
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
  build(ctx) {
    const control = ctx.control();
    const sense = ctx.port('1');
    const nc = control.addContact(ctx.terminal('11'), ctx.terminal('12'), true, ctx.componentId);
    const no = control.addContact(ctx.terminal('11'), ctx.terminal('14'), false, ctx.componentId);
    const set = ctx.num('setPressure');
    const hysteresis = ctx.num('hysteresis');
    let operated = false;
    const margin = (api: RuntimeApi) => api.pressure(sense) - api.ambientPa() - (operated ? set - hysteresis : set);
    const apply = (api: RuntimeApi) => {
      const now = margin(api) > 0 ? true : operated && margin(api) >= 0;
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
      signals: () => ({ operated: operated ? 1 : 0 }),
    };
  },
};
