import { defineDirectionalValve, FIVE_PORT_SIDE_A } from './directional-valve';

/** 4/2 directional control valve with one exhaust port 3. */
export const valve42 = defineDirectionalValve({
  id: 'valve-4-2',
  label: '4/2 valve',
  description: 'At rest 1 feeds 2 and 4 exhausts to 3; actuated 1 feeds 4 and 2 exhausts to 3.',
  ports: [
    { id: '1', role: 'supply' },
    { id: '2', role: 'working' },
    { id: '4', role: 'working' },
    { id: '3', role: 'exhaust' },
    { id: '14', role: 'pilot' },
    { id: '12', role: 'pilot' },
  ],
  positions: [
    FIVE_PORT_SIDE_A,
    { name: 'b', passages: [['1', '2'], ['4', '3']] },
  ],
  pilotPorts: ['14', '12'],
});
