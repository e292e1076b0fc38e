import { defineDirectionalValve, OPEN_1_2, THREE_PORTS } from './directional-valve';

/** Lever-operated 3/2 shut-off valve: closed, it blocks the supply and exhausts the plant side. */
export const shutOffValve = defineDirectionalValve({
  id: 'shut-off-valve',
  label: 'Shut-off valve',
  description: 'Lever with detent: open joins 1 to 2; closed blocks 1 and exhausts 2 to 3 so the machine is left without stored air.',
  category: 'supply',
  ports: THREE_PORTS,
  positions: [
    OPEN_1_2,
    { name: 'closed', passages: [['2', '3']] },
  ],
  pilotPorts: ['12', '10'],
  defaults: { actuation: 'lever-detent', returnBy: 'detent' },
});
