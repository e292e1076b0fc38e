import { terminals } from './electrical-parameters';
import type { ComponentType } from './types';

/** Diode: conducts from anode A to cathode K only (to decouple two current paths). */
export const diode: ComponentType = {
  id: 'diode',
  version: 1,
  label: 'Diode',
  category: 'electrical',
  description: 'Lets a current path through from A to K, never back.',
  ports: terminals('A', 'K'),
  parameters: {},
  states: [],
  build(ctx) {
    ctx.control().addDiode(ctx.terminal('A'), ctx.terminal('K'), ctx.componentId);
    return {};
  },
};
