import { cylinderParameters, pistonSealLeakParam, rodSealLeakParam, sealLeak } from './cylinder-parameters';
import type { BuildContext, ComponentType, NodeRef, RestrictionRef } from './types';

/**
 * Double-acting cylinder: cap-end port A and rod-end port B, each feeding its
 * chamber through the port's restriction. Optional end cushioning: over the
 * last cushion length of travel the spear closes the main bore, and the air
 * leaving the chamber goes through the cushion needle only; a check valve lets
 * air back in freely for the reverse stroke.
 */
export const cylinderDoubleActing: ComponentType = {
  id: 'cylinder-double-acting',
  version: 1,
  label: 'Double-acting cylinder',
  category: 'actuator',
  description: 'Extends on air to A, retracts on air to B; optional end cushioning and through rod.',
  ports: [
    { id: 'A', role: 'working', label: 'A (cap end)' },
    { id: 'B', role: 'working', label: 'B (rod end)' },
  ],
  parameters: {
    ...cylinderParameters,
    throughRod: { kind: 'flag', label: 'Through rod (rod on both ends)', default: false },
    cushionLength: { kind: 'number', quantity: 'length', label: 'Cushion length (0 = none)', default: 0, min: 0, max: 0.1 },
    cushionConductance: { kind: 'number', quantity: 'conductance', label: 'Cushion needle C', default: 5e-10, min: 1e-12, max: 1e-7 },
    pistonSealLeak: pistonSealLeakParam,
    rodSealLeak: rodSealLeakParam,
  },
  states: ['retracted', 'moving', 'extended'],
  build(ctx) {
    const bore = ctx.num('bore');
    const rod = ctx.num('rod');
    const stroke = ctx.num('stroke');
    const full = (Math.PI * bore * bore) / 4;
    const rodArea = (Math.PI * rod * rod) / 4;
    const throughRod = ctx.flag('throughRod');
    const capChamber = ctx.internalNode('cap-chamber', 0);
    const rodChamber = ctx.internalNode('rod-chamber', 0);
    const capMain = chamberPort(ctx, 'A', capChamber);
    const rodMain = chamberPort(ctx, 'B', rodChamber);
    const piston = ctx.piston({
      name: 'piston',
      capNode: capChamber,
      capArea: throughRod ? full - rodArea : full,
      rodNode: rodChamber,
      rodSideArea: full - rodArea,
      ambientArea: throughRod ? 0 : rodArea,
      strokeM: stroke,
      deadVolumeCapM3: ctx.num('deadVolumeCap'),
      deadVolumeRodM3: ctx.num('deadVolumeRod'),
      movingMassKg: ctx.num('movingMass'),
      loadN: ctx.num('load'),
      coulombN: ctx.num('coulombFriction'),
      breakawayN: Math.max(ctx.num('breakawayFriction'), ctx.num('coulombFriction')),
      viscousNsPerM: ctx.num('viscousFriction'),
      springPreloadN: 0,
      springRateNPerM: 0,
      polytropicExponent: ctx.num('polytropicExponent'),
      startPositionM: Math.min(ctx.num('startPosition'), stroke),
    });
    sealLeak(ctx, 'pistonSealLeak', capChamber, rodChamber);
    sealLeak(ctx, 'rodSealLeak', rodChamber, ctx.atmosphere());
    const cushion = ctx.num('cushionLength');
    if (cushion <= 0) return {};
    // Cushioning: needle and return check beside each main port passage.
    for (const [port, chamber] of [['A', capChamber], ['B', rodChamber]] as const) {
      ctx.restriction({ name: `cushion-needle-${port}`, from: chamber, to: ctx.port(port), conductance: ctx.num('cushionConductance'), criticalRatio: 0.3 });
      ctx.restriction({ name: `cushion-check-${port}`, from: ctx.port(port), to: chamber, conductance: ctx.num('portConductance'), criticalRatio: 0.3, oneWay: true, crackingPa: 5_000 });
    }
    const inCushion = [false, false];
    const guardValues = [0, 0];
    return {
      guards(api) {
        const x = api.position(piston);
        // Cap side cushions near retraction, rod side near full extension.
        guardValues[0] = cushion - x;
        guardValues[1] = x - (stroke - cushion);
        return guardValues;
      },
      onGuard(index, rising, api) {
        inCushion[index] = rising;
        api.setOpening(index === 0 ? capMain : rodMain, rising ? 0 : 1);
        if (rising) api.event('cushioning', index === 0 ? 'cap end' : 'rod end');
      },
      start(api) {
        const x = api.position(piston);
        if (x < cushion) api.setOpening(capMain, 0);
        if (x > stroke - cushion) api.setOpening(rodMain, 0);
      },
    };
  },
};

function chamberPort(ctx: BuildContext, port: string, chamber: NodeRef): RestrictionRef {
  return ctx.restriction({ name: `port-${port}`, from: ctx.port(port), to: chamber, conductance: ctx.num('portConductance'), criticalRatio: 0.3 });
}
