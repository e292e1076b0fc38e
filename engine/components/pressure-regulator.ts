import { conductanceParam, criticalRatioParam } from './parameters';
import type { ComponentType } from './types';

/** Smooth 0→1 step over [0, 1] with its derivative (cubic, continuous slope at both ends). */
function smoothStep(u: number): { k: number; dk: number } {
  if (u <= 0) return { k: 0, dk: 0 };
  if (u >= 1) return { k: 1, dk: 0 };
  return { k: u * u * (3 - 2 * u), dk: 6 * u * (1 - u) };
}

/**
 * Pressure regulator: opens 1→2 in proportion to how far the outlet is below the
 * set pressure (so the outlet droops as flow rises), and, when relieving, vents
 * 2→3 once the outlet rises above it.
 */
export const pressureRegulator: ComponentType = {
  id: 'pressure-regulator',
  version: 1,
  label: 'Pressure regulator',
  category: 'supply',
  description: 'Keeps the outlet near the set pressure; droops with flow; optionally relieving.',
  ports: [
    { id: '1', role: 'supply' },
    { id: '2', role: 'working' },
    { id: '3', role: 'exhaust' },
  ],
  parameters: {
    setPressure: { kind: 'number', quantity: 'pressure-gauge', label: 'Set pressure', default: 400_000, min: 0, max: 1_200_000 },
    band: { kind: 'number', quantity: 'pressure-difference', label: 'Proportional band (droop)', default: 30_000, min: 1000, max: 300_000 },
    conductance: conductanceParam('Sonic conductance C, fully open', 2e-8),
    criticalRatio: criticalRatioParam,
    relieving: { kind: 'flag', label: 'Relieving', default: true },
    reliefConductance: conductanceParam('Relief conductance C', 3e-9),
  },
  states: ['regulating'],
  inputs: ['set'],
  build(ctx) {
    const inlet = ctx.port('1');
    const outlet = ctx.port('2');
    const band = ctx.num('band');
    let setAbs = ctx.ambientPa() + ctx.num('setPressure');
    ctx.restriction({
      name: 'regulating',
      from: inlet,
      to: outlet,
      conductance: ctx.num('conductance'),
      criticalRatio: ctx.num('criticalRatio'),
      modulator: {
        control: outlet,
        fn: (p) => {
          const s = smoothStep((setAbs - p) / band);
          return { k: s.k, dk: -s.dk / band };
        },
      },
    });
    if (ctx.flag('relieving')) {
      ctx.restriction({
        name: 'relief',
        from: outlet,
        to: ctx.port('3'),
        conductance: ctx.num('reliefConductance'),
        criticalRatio: ctx.num('criticalRatio'),
        modulator: {
          control: outlet,
          fn: (p) => {
            const s = smoothStep((p - setAbs - band / 2) / band);
            return { k: s.k, dk: s.dk / band };
          },
        },
      });
    }
    return {
      onInput(command, api) {
        if (command.action === 'set' && command.value !== undefined) {
          setAbs = api.ambientPa() + command.value;
          api.event('set-pressure-changed', `${command.value} Pa gauge`);
        }
      },
    };
  },
};
