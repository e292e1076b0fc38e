import { conductanceParam, criticalRatioParam } from './parameters';
import type { ComponentType } from './types';

/** Lubricator of a service unit: a passage from 1 to 2. */
export const lubricator: ComponentType = {
  id: 'lubricator',
  version: 1,
  label: 'Lubricator',
  category: 'supply',
  description: 'Oil-mist lubricator; passive, a small flow resistance.',
  ports: [
    { id: '1', role: 'supply' },
    { id: '2', role: 'working' },
  ],
  parameters: { conductance: conductanceParam('Sonic conductance C', 3e-8), criticalRatio: criticalRatioParam },
  states: [],
  build(ctx) {
    ctx.restriction({ name: 'passage', from: ctx.port('1'), to: ctx.port('2'), conductance: ctx.num('conductance'), criticalRatio: ctx.num('criticalRatio') });
    return {};
  },
};
