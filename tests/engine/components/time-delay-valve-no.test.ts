import { describe, expect, it } from 'vitest';
import { eventTime, portBar, timerRun } from './harness';

const CONTROL = 0.1;

describe('time-delay-valve-no', () => {
  it('cuts off and exhausts its output some time after the control air arrives, not before', () => {
    const trace = timerRun('time-delay-valve-no', 4e-10);
    const off = eventTime(trace, 'td', 'switched', 0, 'exhausting');
    expect(off - CONTROL).toBeGreaterThan(0.1);
    expect(Math.abs(portBar(trace, 'td', '2', CONTROL - 0.01) - 6)).toBeLessThan(0.05);
    expect(Math.abs(portBar(trace, 'td', '2', off - 0.02) - 6)).toBeLessThan(0.05);
    expect(portBar(trace, 'td', '2', off + 0.2)).toBeLessThan(0.05);
  });

  it('a smaller timer throttle C gives a longer delay', () => {
    const fast = eventTime(timerRun('time-delay-valve-no', 4e-10), 'td', 'switched', 0, 'exhausting') - CONTROL;
    const slow = eventTime(timerRun('time-delay-valve-no', 2e-10), 'td', 'switched', 0, 'exhausting') - CONTROL;
    expect(slow).toBeGreaterThan(1.4 * fast);
  });

  it('resets quickly when the control air goes: the output comes back', () => {
    const trace = timerRun('time-delay-valve-no', 4e-10, 1.5);
    const back = eventTime(trace, 'td', 'switched', 1.5, 'open');
    expect(back - 1.5).toBeLessThan(0.15);
    expect(Math.abs(portBar(trace, 'td', '2', 2.45) - 6)).toBeLessThan(0.05);
  });
});
