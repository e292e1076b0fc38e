import { conductanceParam, criticalRatioParam } from './parameters';
import type { ComponentType } from './types';

/** Pressure difference that must build before a logic valve's ball or spool changes sides, Pa (from memory: a few kPa). */
export const LOGIC_CHANGEOVER_PA = 10_000;

/** Time the ball or spool takes to change sides, s (from memory: a few milliseconds). */
export const LOGIC_TRAVEL_S = 0.003;

/**
 * Shared model of the two logic valves: inputs 1.1 and 1.2 (both numbered 1 on
 * the symbol), output 2. `passes` picks which input joins the output: the one
 * with the lower pressure (two-pressure valve, AND) or the higher (shuttle, OR).
 * With equal pressures the input already joined stays joined.
 */
export function defineLogicValve(def: { id: string; label: string; description: string; passes: 'lower' | 'higher' }): ComponentType {
  return {
    id: def.id,
    version: 1,
    label: def.label,
    category: 'logic',
    description: def.description,
    ports: [
      { id: '1.1', role: 'signal', label: '1' },
      { id: '1.2', role: 'signal', label: '1' },
      { id: '2', role: 'working' },
    ],
    parameters: { conductance: conductanceParam('Sonic conductance C', 5e-9), criticalRatio: criticalRatioParam },
    states: ['1.1 joined', '1.2 joined'],
    build(ctx) {
      const inputs = [ctx.port('1.1'), ctx.port('1.2')] as const;
      const out = ctx.port('2');
      const passages = inputs.map((node, i) =>
        ctx.restriction({ name: `1.${i + 1}-2`, from: node, to: out, conductance: ctx.num('conductance'), criticalRatio: ctx.num('criticalRatio'), opening: i === 0 ? 1 : 0 }),
      );
      let joined = 0;
      let moving = false;
      // Positive when input 1.2 should take over from 1.1 (or the reverse), beyond the changeover margin.
      const preference = (p1: number, p2: number) => (def.passes === 'lower' ? p1 - p2 : p2 - p1);
      const guardValues = [0];
      return {
        guards(api) {
          const d = preference(api.pressure(inputs[0]), api.pressure(inputs[1]));
          guardValues[0] = joined === 0 ? d - LOGIC_CHANGEOVER_PA : -d - LOGIC_CHANGEOVER_PA;
          return guardValues;
        },
        onGuard(_index, rising, api) {
          if (!rising || moving) return;
          moving = true;
          api.schedule(LOGIC_TRAVEL_S, 'changeover');
        },
        onTimer(_tag, api) {
          moving = false;
          // Only change sides if the pressure difference still calls for it on arrival.
          const d = preference(api.pressure(inputs[0]), api.pressure(inputs[1]));
          if ((joined === 0 ? d : -d) <= LOGIC_CHANGEOVER_PA) return;
          joined = 1 - joined;
          passages.forEach((ref, i) => api.setOpening(ref, i === joined ? 1 : 0));
          api.event('switched', `1.${joined + 1} joined`);
        },
        start(api) {
          const d = preference(api.pressure(inputs[0]), api.pressure(inputs[1]));
          if (d > LOGIC_CHANGEOVER_PA) {
            joined = 1;
            passages.forEach((ref, i) => api.setOpening(ref, i === joined ? 1 : 0));
          }
        },
        signals: () => ({ joined: joined + 1 }),
      };
    },
  };
}
