import { cylinderParameters, pistonSealLeakParam, sealLeak } from './cylinder-parameters';
import { withDefault } from './parameters';
import type { ComponentType } from './types';

/** Single-acting cylinder: air on A extends it, a spring returns it; the rod side breathes to atmosphere. */
export const cylinderSingleActing: ComponentType = {
  id: 'cylinder-single-acting',
  version: 1,
  label: 'Single-acting cylinder',
  category: 'actuator',
  description: 'Extends on air to A against a return spring.',
  ports: [{ id: 'A', role: 'working', label: 'A (cap end)' }],
  parameters: {
    ...cylinderParameters,
    bore: withDefault(cylinderParameters.bore!, 0.025),
    stroke: withDefault(cylinderParameters.stroke!, 0.05),
    springPreload: { kind: 'number', quantity: 'force', label: 'Spring force, retracted', default: 20, min: 0, max: 10_000 },
    springRate: { kind: 'number', quantity: 'stiffness', label: 'Spring rate', default: 400, min: 0, max: 1_000_000 },
    pistonSealLeak: pistonSealLeakParam,
  },
  states: ['retracted', 'moving', 'extended'],
  build(ctx) {
    const bore = ctx.num('bore');
    const rod = ctx.num('rod');
    const full = (Math.PI * bore * bore) / 4;
    const chamber = ctx.internalNode('cap-chamber', 0);
    ctx.restriction({ name: 'port-A', from: ctx.port('A'), to: chamber, conductance: ctx.num('portConductance'), criticalRatio: 0.3 });
    // The spring side breathes to atmosphere, so air past the piston seal is lost.
    sealLeak(ctx, 'pistonSealLeak', chamber, ctx.atmosphere());
    ctx.piston({
      name: 'piston',
      capNode: chamber,
      capArea: full,
      rodNode: null,
      // The spring side is vented: ambient acts on the annulus and on the rod, i.e. on the full area.
      rodSideArea: full - (Math.PI * rod * rod) / 4,
      ambientArea: (Math.PI * rod * rod) / 4,
      strokeM: ctx.num('stroke'),
      deadVolumeCapM3: ctx.num('deadVolumeCap'),
      deadVolumeRodM3: 0,
      movingMassKg: ctx.num('movingMass'),
      loadN: ctx.num('load'),
      coulombN: ctx.num('coulombFriction'),
      breakawayN: Math.max(ctx.num('breakawayFriction'), ctx.num('coulombFriction')),
      viscousNsPerM: ctx.num('viscousFriction'),
      springPreloadN: ctx.num('springPreload'),
      springRateNPerM: ctx.num('springRate'),
      polytropicExponent: ctx.num('polytropicExponent'),
      startPositionM: Math.min(ctx.num('startPosition'), ctx.num('stroke')),
    });
    return {};
  },
};
