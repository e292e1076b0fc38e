import { conductanceParam, criticalRatioParam } from './parameters';
import type { ComponentType } from './types';

/** Check valve: flow from 1 to 2 once the pressure difference exceeds the cracking pressure; none back. */
export const checkValve: ComponentType = {
  id: 'check-valve',
  version: 1,
  label: 'Check valve',
  category: 'logic',
  description: 'Non-return valve: free flow 1→2 above the cracking pressure, blocked 2→1.',
  ports: [
    { id: '1', role: 'working' },
    { id: '2', role: 'working' },
  ],
  parameters: {
    crackingPressure: { kind: 'number', quantity: 'pressure-difference', label: 'Cracking pressure', default: 10_000, min: 0, max: 500_000 },
    conductance: conductanceParam('Sonic conductance C', 1e-8),
    criticalRatio: criticalRatioParam,
  },
  states: [],
  build(ctx) {
    ctx.restriction({
      name: 'check',
      from: ctx.port('1'),
      to: ctx.port('2'),
      conductance: ctx.num('conductance'),
      criticalRatio: ctx.num('criticalRatio'),
      oneWay: true,
      crackingPa: ctx.num('crackingPressure'),
    });
    return {};
  },
};
