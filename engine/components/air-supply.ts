import type { ComponentType, NodeRef } from './types';

/** Choked conductance of an ideal supply line, m³/(s·Pa): large enough never to limit a valve (from memory). */
const STIFF_SUPPLY_C = 1e-6;

/**
 * Compressed-air supply: holds its set pressure, optionally behind a receiver
 * volume and a delivery limit (the compressor's free-air delivery).
 */
export const airSupply: ComponentType = {
  id: 'air-supply',
  version: 1,
  label: 'Compressed-air supply',
  category: 'supply',
  description: 'Pressure source with set pressure; optional receiver volume and delivery limit.',
  ports: [{ id: '2', role: 'working', label: 'out' }],
  parameters: {
    pressure: { kind: 'number', quantity: 'pressure-gauge', label: 'Set pressure', default: 600_000, min: 0, max: 1_600_000 },
    receiverVolume: { kind: 'number', quantity: 'volume', label: 'Receiver volume (0 = none)', default: 0, min: 0, max: 10 },
    deliveryLimit: { kind: 'number', quantity: 'volume-flow-anr', label: 'Delivery limit, free air (0 = unlimited)', default: 0, min: 0, max: 1 },
  },
  states: ['on'],
  inputs: ['set'],
  build(ctx) {
    const sourcePa = ctx.ambientPa() + ctx.num('pressure');
    const limit = ctx.num('deliveryLimit');
    const receiverVolume = ctx.num('receiverVolume');
    let source: NodeRef;
    if (limit <= 0 && receiverVolume <= 0) {
      // An ideal supply holds its outlet line at the set pressure: that line is a boundary.
      source = ctx.holdPort('2', sourcePa);
    } else {
      source = ctx.fixedPressure('source', sourcePa);
      const out = ctx.port('2');
      // Choked flow at ANR is q = C·p1 (ISO 6358-1), so a delivery limit q at the set pressure gives C = q/p1.
      const conductance = limit > 0 ? limit / sourcePa : STIFF_SUPPLY_C;
      const receiver = receiverVolume > 0 ? ctx.internalNode('receiver', receiverVolume) : null;
      ctx.restriction({ name: 'feed', from: source, to: receiver ?? out, conductance, criticalRatio: 0.5 });
      if (receiver) ctx.restriction({ name: 'outlet', from: receiver, to: out, conductance: STIFF_SUPPLY_C, criticalRatio: 0.5 });
    }
    return {
      onInput(command, api) {
        if (command.action === 'set' && (command.parameter ?? 'pressure') === 'pressure' && command.value !== undefined) {
          api.setFixedPressure(source, api.ambientPa() + command.value);
          api.event('supply-changed', `${command.value} Pa gauge`);
        }
      },
    };
  },
};
