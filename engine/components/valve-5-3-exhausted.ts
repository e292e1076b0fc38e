import { defineDirectionalValve, FIVE_PORT_SIDE_A, FIVE_PORT_SIDE_B, FIVE_PORTS } from './directional-valve';

/** 5/3 directional control valve, exhausted centre: both working lines exhausted and supply blocked, so a cylinder can be pushed by hand. */
export const valve53Exhausted = defineDirectionalValve({
  id: 'valve-5-3-exhausted',
  label: '5/3 valve, exhausted centre',
  description: 'Three positions, centred by springs: side 14 feeds 4, side 12 feeds 2; in the centre both working lines exhausted and supply blocked, so a cylinder can be pushed by hand.',
  ports: FIVE_PORTS,
  positions: [
    FIVE_PORT_SIDE_A,
    { name: 'centre', passages: [['2', '3'], ['4', '5']] },
    FIVE_PORT_SIDE_B,
  ],
  pilotPorts: ['14', '12'],
});
