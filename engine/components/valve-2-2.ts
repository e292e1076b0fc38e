import { defineDirectionalValve, OPEN_1_2 } from './directional-valve';

/** 2/2 directional control valve, normally closed: actuated joins 1 and 2. */
export const valve22 = defineDirectionalValve({
  id: 'valve-2-2',
  label: '2/2 valve, normally closed',
  description: 'Two ports, two positions: passes air from 1 to 2 only while actuated.',
  ports: [
    { id: '1', role: 'supply' },
    { id: '2', role: 'working' },
    { id: '12', role: 'pilot' },
    { id: '10', role: 'pilot' },
  ],
  positions: [
    OPEN_1_2,
    { name: 'closed', passages: [] },
  ],
  pilotPorts: ['12', '10'],
  // Mostly a button, roller or pilot signal: it sits with the signal elements on a drawing.
  category: 'input',
});
