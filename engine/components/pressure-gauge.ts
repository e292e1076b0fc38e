import type { ComponentType } from './types';

/** Measuring point: adds nothing to the air circuit; its port pressure is in the trace. */
export const pressureGauge: ComponentType = {
  id: 'pressure-gauge',
  version: 1,
  label: 'Pressure gauge',
  category: 'measurement',
  description: 'Shows the pressure at the point it is connected to.',
  ports: [{ id: '1', role: 'signal' }],
  parameters: {},
  states: [],
  build() {
    return {};
  },
};
