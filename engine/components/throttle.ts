import { conductanceParam, criticalRatioParam } from './parameters';
import type { ComponentType, ParameterSpec } from './types';

export const openingParam: ParameterSpec = {
  kind: 'number',
  quantity: 'fraction',
  label: 'Opening',
  default: 0.3,
  min: 0,
  max: 1,
  description: 'Needle setting: the fraction of the fully open conductance.',
};

/** Adjustable throttle: the same restriction in both directions. */
export const throttle: ComponentType = {
  id: 'throttle',
  version: 1,
  label: 'Throttle valve',
  category: 'logic',
  description: 'Adjustable restriction acting in both directions.',
  ports: [
    { id: '1', role: 'working' },
    { id: '2', role: 'working' },
  ],
  parameters: { opening: openingParam, conductance: conductanceParam('Sonic conductance C, fully open', 1e-8), criticalRatio: criticalRatioParam },
  states: [],
  inputs: ['set'],
  build(ctx) {
    const needle = ctx.restriction({
      name: 'throttle',
      from: ctx.port('1'),
      to: ctx.port('2'),
      conductance: ctx.num('conductance'),
      criticalRatio: ctx.num('criticalRatio'),
      opening: ctx.num('opening'),
    });
    return {
      onInput(command, api) {
        if (command.action === 'set' && command.value !== undefined) api.setOpening(needle, Math.min(Math.max(command.value, 0), 1));
      },
    };
  },
};
