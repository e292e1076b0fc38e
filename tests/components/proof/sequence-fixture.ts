import type { ObservedSequence } from '@/engine/proof/sequence';

/** Both start retracted: 1A1 out, then 2A1 out while 1A1 rests, then both in, 2A1 only halfway when the run ends. */
export const twoCylinderSequence: ObservedSequence = {
  actuators: [
    { componentId: 'a', tag: '1A1', label: 'Lid press', initial: 0, initialLevel: 0 },
    { componentId: 'b', tag: '2A1', label: 'Carton stop', initial: 0, initialLevel: 0 },
  ],
  steps: [
    { index: 0, startS: 0, endS: 0.25, motions: [], trigger: null, cause: null },
    { index: 1, startS: 0.25, endS: 0.75, motions: [{ componentId: 'a', tag: '1A1', direction: 'out', from: 0, to: 1, fromLevel: 0, toLevel: 1 }], trigger: 'S1 pressed', cause: { componentId: 's1', tag: 'S1' } },
    { index: 2, startS: 0.75, endS: 1.1, motions: [{ componentId: 'b', tag: '2A1', direction: 'out', from: 0, to: 1, fromLevel: 0, toLevel: 1 }], trigger: '1B2 on', cause: { componentId: 'b2', tag: '1B2' } },
    {
      index: 3,
      startS: 1.1,
      endS: 1.6,
      motions: [
        { componentId: 'a', tag: '1A1', direction: 'in', from: 1, to: 0, fromLevel: 1, toLevel: 0 },
        { componentId: 'b', tag: '2A1', direction: 'in', from: 1, to: 'mid', fromLevel: 1, toLevel: 0.5 },
      ],
      trigger: '2A1 reached its end (extended)',
      cause: { componentId: 'b', tag: '2A1' },
    },
  ],
};
