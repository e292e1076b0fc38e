import { conductanceParam, criticalRatioParam } from './parameters';
import type { ComponentType } from './types';

/** Silencer on an exhaust port: a restriction to atmosphere. */
export const silencer: ComponentType = {
  id: 'silencer',
  version: 1,
  label: 'Silencer',
  category: 'supply',
  description: 'Exhaust silencer; its flow resistance slows the exhausting side.',
  ports: [{ id: '1', role: 'working' }],
  parameters: { conductance: conductanceParam('Sonic conductance C', 1.5e-8), criticalRatio: criticalRatioParam },
  states: [],
  build(ctx) {
    ctx.restriction({ name: 'exhaust', from: ctx.port('1'), to: ctx.atmosphere(), conductance: ctx.num('conductance'), criticalRatio: ctx.num('criticalRatio') });
    return {};
  },
};
