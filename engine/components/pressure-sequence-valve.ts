import { defineDirectionalValve, EXHAUST_2_3, OPEN_1_2, THREE_PORTS } from './directional-valve';

/** Pressure sequence valve: a 3/2 valve that opens 1→2 once the control pressure on 12 reaches its setting. */
export const pressureSequenceValve = defineDirectionalValve({
  id: 'pressure-sequence-valve',
  label: 'Pressure sequence valve',
  description: 'Switches when the pressure on control port 12 reaches the adjustable switching pressure.',
  category: 'logic',
  ports: THREE_PORTS,
  positions: [
    OPEN_1_2,
    EXHAUST_2_3,
  ],
  pilotPorts: ['12', '10'],
  defaults: { actuation: 'pilot', returnBy: 'spring', pilotThreshold: 300_000 },
});
