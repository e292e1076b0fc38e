import { describe, expect, it } from 'vitest';
import { runLimitS } from '@/components/editor/run/use-live-run';

describe('how long a live run may go on', () => {
  it('is ten minutes for a drawing of ordinary size, and shorter where the page would hold more than 25 million values', () => {
    // The largest demo has 37 signals: 60 000 rows of 37 values stay well inside the budget.
    expect(runLimitS(37)).toBe(600);
    // 1 000 signals: 25 000 rows, at 10 ms each 250 s.
    expect(runLimitS(1000)).toBe(250);
  });
});
