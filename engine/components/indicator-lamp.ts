import { switchedLoad, terminals } from './electrical-parameters';
import type { ComponentType } from './types';

export const indicatorLamp: ComponentType = {
  id: 'indicator-lamp',
  version: 1,
  label: 'Indicator lamp',
  category: 'electrical',
  description: 'Lamp (X1–X2) lit while energised.',
  ports: terminals('X1', 'X2'),
  parameters: {},
  states: ['dark', 'lit'],
  build(ctx) {
    ctx.control().addLoad(ctx.terminal('X1'), ctx.terminal('X2'), ctx.componentId);
    let lit = false;
    return {
      onInput(command, api) {
        const now = switchedLoad(command, lit);
        if (now === null) return;
        lit = now;
        api.event(lit ? 'lit' : 'dark');
      },
      signals() {
        return { lit: lit ? 1 : 0 };
      },
    };
  },
};
