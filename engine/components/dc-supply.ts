import type { ComponentType } from './types';

/**
 * 24 V DC control supply (the common control voltage of machine control circuits, in the
 * context of IEC 60204-1 — common practice). Its rails are L+ and M (0 V). The simulation
 * treats it as ideal: what matters is which loads see a path to both rails. Loss of control
 * power is an input, `set` `power` 0 (1 restores it): every load it feeds drops out.
 */
export const dcSupply: ComponentType = {
  id: 'dc-supply',
  version: 1,
  label: 'DC control supply',
  category: 'electrical',
  description: 'Control voltage source with + (L+) and 0 V (M) rails.',
  ports: [
    { id: 'L+', role: 'terminal', label: '+' },
    { id: 'M', role: 'terminal', label: '0 V' },
  ],
  parameters: {
    voltage: { kind: 'number', quantity: 'voltage', label: 'Voltage', default: 24, min: 5, max: 48, description: 'Nominal DC control voltage (shown and documented; loads switch on paths, not on volts).' },
  },
  states: [],
  inputs: ['set'],
  build(ctx) {
    const control = ctx.control();
    const supply = control.addSupply(ctx.terminal('L+'), ctx.terminal('M'));
    let powered = true;
    return {
      start(api) {
        control.settle(api);
      },
      onInput(command, api) {
        if (command.action !== 'set' || command.parameter !== 'power' || command.value === undefined) return;
        const now = command.value > 0;
        if (now === powered) return;
        powered = now;
        api.event(powered ? 'power-restored' : 'power-lost');
        control.setSupplyPowered(supply, powered, api);
      },
    };
  },
};

