import { EXHAUST_2_3, OPEN_1_2, THREE_PORTS } from './directional-valve';
import { defineTimeDelayValve } from './time-delay-valve';

/** Time-delay valve, normally open: 2 is cut off and exhausted a set time after control air reaches 12. */
export const timeDelayValveNo = defineTimeDelayValve({
  id: 'time-delay-valve-no',
  label: 'Time-delay valve, normally open',
  description: 'Throttle, reservoir and 3/2 NO valve: output 2 switches off after the reservoir fills.',
  ports: THREE_PORTS,
  positions: [
    EXHAUST_2_3,
    OPEN_1_2,
  ],
  pilotPorts: ['12', '10'],
});
