import { defineDirectionalValve, FIVE_PORT_SIDE_A, FIVE_PORT_SIDE_B, FIVE_PORTS } from './directional-valve';

/** 5/2 directional control valve: the usual final control element of a double-acting cylinder. */
export const valve52 = defineDirectionalValve({
  id: 'valve-5-2',
  label: '5/2 valve',
  description: 'At rest (side 12) 1 feeds 2 and 4 exhausts to 5; actuated (side 14) 1 feeds 4 and 2 exhausts to 3.',
  ports: FIVE_PORTS,
  positions: [
    FIVE_PORT_SIDE_A,
    FIVE_PORT_SIDE_B,
  ],
  pilotPorts: ['14', '12'],
});
