import { defineDirectionalValve, FIVE_PORT_SIDE_A, FIVE_PORT_SIDE_B, FIVE_PORTS } from './directional-valve';

/** 5/3 directional control valve, closed centre: all ports blocked, so a cylinder is held where it stops (as far as the air is tight). */
export const valve53Closed = defineDirectionalValve({
  id: 'valve-5-3-closed',
  label: '5/3 valve, closed centre',
  description: 'Three positions, centred by springs: side 14 feeds 4, side 12 feeds 2; in the centre all ports blocked, so a cylinder is held where it stops (as far as the air is tight).',
  ports: FIVE_PORTS,
  positions: [
    FIVE_PORT_SIDE_A,
    { name: 'centre', passages: [] },
    FIVE_PORT_SIDE_B,
  ],
  pilotPorts: ['14', '12'],
});
