import { conductanceParam, criticalRatioParam } from './parameters';
import type { ComponentType } from './types';

/** Pressure drop across the disc that opens the exhaust, Pa (from memory: a tenth of a bar). */
const OPENING_DIFFERENCE_PA = 10_000;

/**
 * How far the supply side must rise above the cylinder side to push the disc back
 * onto the exhaust seat, Pa (modelling choice: the disc's lip seal holds it off the
 * seat while the supply line still drains back through the directional valve).
 */
const RESEAT_DIFFERENCE_PA = 100_000;

/** Time the disc takes to travel between its seats, s (from memory: a few milliseconds). */
const DISC_TRAVEL_S = 0.005;

/**
 * Quick exhaust valve: supply 1 fills the cylinder port 2 through the disc; when
 * 1 falls below 2 the disc lifts and 2 exhausts straight to 3 through a large
 * passage, bypassing the long line back to the valve.
 */
export const quickExhaustValve: ComponentType = {
  id: 'quick-exhaust-valve',
  version: 1,
  label: 'Quick exhaust valve',
  category: 'logic',
  description: 'Fills 1→2; exhausts 2→3 directly when the supply side 1 drops.',
  ports: [
    { id: '1', role: 'supply' },
    { id: '2', role: 'working' },
    { id: '3', role: 'exhaust' },
  ],
  parameters: {
    conductance: conductanceParam('Filling C (1→2)', 1e-8),
    exhaustConductance: conductanceParam('Exhaust C (2→3)', 3e-8),
    criticalRatio: criticalRatioParam,
  },
  states: ['filling', 'exhausting'],
  build(ctx) {
    const inlet = ctx.port('1');
    const work = ctx.port('2');
    const fill = ctx.restriction({ name: 'fill', from: inlet, to: work, conductance: ctx.num('conductance'), criticalRatio: ctx.num('criticalRatio'), oneWay: true, crackingPa: 2_000 });
    const exhaust = ctx.restriction({ name: 'exhaust', from: work, to: ctx.port('3'), conductance: ctx.num('exhaustConductance'), criticalRatio: ctx.num('criticalRatio'), opening: 0 });
    let exhausting = false;
    let wantsExhaust = false;
    let moving = false;
    const guardValues = [0];
    return {
      guards(api) {
        const d = api.pressure(work) - api.pressure(inlet);
        guardValues[0] = wantsExhaust ? d + RESEAT_DIFFERENCE_PA : d - OPENING_DIFFERENCE_PA;
        return guardValues;
      },
      onGuard(_i, rising, api) {
        wantsExhaust = rising;
        if (!moving) {
          moving = true;
          api.schedule(DISC_TRAVEL_S, 'disc');
        }
      },
      onTimer(_tag, api) {
        moving = false;
        if (wantsExhaust === exhausting) return;
        exhausting = wantsExhaust;
        // One disc, two seats: lifted off the exhaust seat it closes the supply port.
        api.setOpening(exhaust, exhausting ? 1 : 0);
        api.setOpening(fill, exhausting ? 0 : 1);
        api.event('switched', exhausting ? 'exhausting' : 'filling');
      },
      signals: () => ({ exhausting: exhausting ? 1 : 0 }),
    };
  },
};
