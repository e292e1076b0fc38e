import { EXHAUST_2_3, OPEN_1_2, THREE_PORTS } from './directional-valve';
import { defineTimeDelayValve } from './time-delay-valve';

/** Time-delay valve, normally closed: 2 is fed from 1 a set time after control air reaches 12. */
export const timeDelayValveNc = defineTimeDelayValve({
  id: 'time-delay-valve-nc',
  label: 'Time-delay valve, normally closed',
  description: 'Throttle, reservoir and 3/2 NC valve: output 2 switches on after the reservoir fills.',
  ports: THREE_PORTS,
  positions: [
    OPEN_1_2,
    EXHAUST_2_3,
  ],
  pilotPorts: ['12', '10'],
});
