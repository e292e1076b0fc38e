import { describe, expect, it } from 'vitest';
import { TimeQueue } from '@/engine/solver/time-queue';

describe('TimeQueue', () => {
  it('always offers the partition furthest behind, ties to the lower index, as times move both ways', () => {
    const times = [0.5, 0.2, 0.2, 0.9, 0.1];
    // The queue reads each member's time as it is now, as it reads a partition's.
    const members = times.map((_, i) => ({
      get time() {
        return times[i]!;
      },
    }));
    const queue = new TimeQueue(members);
    expect(queue.top()).toBe(4);
    // Stepping forward: 4 passes everyone; 1 and 2 tie, the lower index first.
    times[4] = 1.2;
    queue.update(4);
    expect(queue.top()).toBe(1);
    times[1] = 0.3;
    queue.update(1);
    expect(queue.top()).toBe(2);
    // Undoing a step moves a partition back to the front.
    times[3] = 0.05;
    queue.update(3);
    expect(queue.top()).toBe(3);
    // A long random walk agrees with a plain scan.
    let seed = 7;
    const random = () => ((seed = (seed * 16807) % 2147483647) / 2147483647);
    for (let n = 0; n < 500; n += 1) {
      const i = Math.floor(random() * times.length);
      times[i] = Math.round(random() * 20) / 10;
      queue.update(i);
      const expected = times.reduce((best, t, j) => (t < times[best]! ? j : best), 0);
      expect(queue.top()).toBe(expected);
    }
  });
});
