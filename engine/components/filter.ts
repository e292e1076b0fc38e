import { conductanceParam, criticalRatioParam } from './parameters';
import type { ComponentType } from './types';

/** Filter of a service unit: a passage from 1 to 2. */
export const filter: ComponentType = {
  id: 'filter',
  version: 1,
  label: 'Filter',
  category: 'supply',
  description: 'Air filter; its pressure drop grows with flow.',
  ports: [
    { id: '1', role: 'supply' },
    { id: '2', role: 'working' },
  ],
  parameters: { conductance: conductanceParam('Sonic conductance C', 2e-8), criticalRatio: criticalRatioParam },
  states: [],
  build(ctx) {
    ctx.restriction({ name: 'passage', from: ctx.port('1'), to: ctx.port('2'), conductance: ctx.num('conductance'), criticalRatio: ctx.num('criticalRatio') });
    return {};
  },
};
