import { defineDirectionalValve, EXHAUST_2_3, OPEN_1_2 } from './directional-valve';

/** 3/2 directional control valve, normally open: at rest 1 feeds 2; actuated 2 exhausts to 3. */
export const valve32No = defineDirectionalValve({
  id: 'valve-3-2-no',
  label: '3/2 valve, normally open',
  description: 'Supply 1 passes to 2 at rest; actuation blocks 1 and exhausts 2 to 3.',
  ports: [
    { id: '1', role: 'supply' },
    { id: '2', role: 'working' },
    { id: '3', role: 'exhaust' },
    { id: '10', role: 'pilot' },
    { id: '12', role: 'pilot' },
  ],
  positions: [
    EXHAUST_2_3,
    OPEN_1_2,
  ],
  pilotPorts: ['10', '12'],
  // Mostly a button, roller or pilot signal: it sits with the signal elements on a drawing.
  category: 'input',
});
