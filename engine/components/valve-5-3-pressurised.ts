import { defineDirectionalValve, FIVE_PORT_SIDE_A, FIVE_PORT_SIDE_B, FIVE_PORTS } from './directional-valve';

/** 5/3 directional control valve, pressurised centre: supply on both working lines and exhausts blocked. */
export const valve53Pressurised = defineDirectionalValve({
  id: 'valve-5-3-pressurised',
  label: '5/3 valve, pressurised centre',
  description: 'Three positions, centred by springs: side 14 feeds 4, side 12 feeds 2; in the centre supply on both working lines and exhausts blocked.',
  ports: FIVE_PORTS,
  positions: [
    FIVE_PORT_SIDE_A,
    { name: 'centre', passages: [['1', '2'], ['1', '4']] },
    FIVE_PORT_SIDE_B,
  ],
  pilotPorts: ['14', '12'],
});
