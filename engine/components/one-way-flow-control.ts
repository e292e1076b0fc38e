import { conductanceParam, criticalRatioParam } from './parameters';
import { openingParam } from './throttle';
import type { ComponentType } from './types';

/**
 * One-way flow control valve: a throttle with a check valve across it. Air flows
 * freely 1→2 through the check and is throttled 2→1. Fitted with 2 towards the
 * cylinder port it meters out (throttles the exhaust of that chamber).
 */
export const oneWayFlowControl: ComponentType = {
  id: 'one-way-flow-control',
  version: 1,
  label: 'One-way flow control valve',
  category: 'logic',
  description: 'Throttle with bypass check valve: free flow 1→2, adjustable flow 2→1.',
  ports: [
    { id: '1', role: 'working' },
    { id: '2', role: 'working' },
  ],
  parameters: {
    opening: openingParam,
    conductance: conductanceParam('Throttle C, fully open', 1e-8),
    checkConductance: conductanceParam('Check valve C', 1e-8),
    criticalRatio: criticalRatioParam,
  },
  states: [],
  inputs: ['set'],
  build(ctx) {
    const a = ctx.port('1');
    const b = ctx.port('2');
    const needle = ctx.restriction({ name: 'throttle', from: a, to: b, conductance: ctx.num('conductance'), criticalRatio: ctx.num('criticalRatio'), opening: ctx.num('opening') });
    ctx.restriction({ name: 'check', from: a, to: b, conductance: ctx.num('checkConductance'), criticalRatio: ctx.num('criticalRatio'), oneWay: true, crackingPa: 5_000 });
    return {
      onInput(command, api) {
        if (command.action === 'set' && command.value !== undefined) api.setOpening(needle, Math.min(Math.max(command.value, 0), 1));
      },
    };
  },
};
