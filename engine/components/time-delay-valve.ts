import { buildValveBehaviour, defineDirectionalValve, type ValveDefinition } from './directional-valve';
import { conductanceParam, portVolumeParam } from './parameters';
import type { ComponentType } from './types';

/**
 * Shared model of the pneumatic timer: control air on 12 fills a small reservoir
 * through an adjustable throttle; when the reservoir reaches the pilot pressure a
 * 3/2 valve switches. A check valve across the throttle empties the reservoir at
 * once when the control air goes, so the timer resets quickly.
 */
export function defineTimeDelayValve(def: Omit<ValveDefinition, 'category' | 'defaults'>): ComponentType {
  const valve = defineDirectionalValve({ ...def, category: 'logic', defaults: { actuation: 'pilot', returnBy: 'spring' } });
  return {
    ...valve,
    parameters: {
      ...valve.parameters,
      reservoirVolume: portVolumeParam('Timer reservoir volume', 5e-5),
      throttleConductance: conductanceParam('Timer throttle C', 2e-10),
    },
    build(ctx) {
      const control = ctx.port('12');
      const tank = ctx.internalNode('timer-reservoir', ctx.num('reservoirVolume'));
      ctx.restriction({ name: 'timer-throttle', from: control, to: tank, conductance: ctx.num('throttleConductance'), criticalRatio: 0.5 });
      ctx.restriction({ name: 'timer-reset', from: tank, to: control, conductance: 5e-9, criticalRatio: 0.5, oneWay: true, crackingPa: 2_000 });
      return buildValveBehaviour(ctx, def, [tank, ctx.port('10')]);
    },
  };
}
