import { defineDirectionalValve, EXHAUST_2_3, OPEN_1_2, THREE_PORTS } from './directional-valve';

/** 3/2 directional control valve, normally closed: at rest 2 exhausts to 3; actuated 1 feeds 2. */
export const valve32Nc = defineDirectionalValve({
  id: 'valve-3-2-nc',
  label: '3/2 valve, normally closed',
  description: 'Supply 1 blocked at rest with the working line 2 exhausted to 3; actuation joins 1 to 2.',
  ports: THREE_PORTS,
  positions: [
    OPEN_1_2,
    EXHAUST_2_3,
  ],
  pilotPorts: ['12', '10'],
  // Mostly a button, roller or pilot signal: it sits with the signal elements on a drawing.
  category: 'input',
});
