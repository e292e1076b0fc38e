import { describe, expect, it } from 'vitest';
import { eventTime, eventsOf, portBar, timerRun } from './harness';

const CONTROL = 0.1;

describe('time-delay-valve-nc', () => {
  it('switches its output on some time after the control air arrives, not before', () => {
    const trace = timerRun('time-delay-valve-nc', 4e-10);
    const on = eventTime(trace, 'td', 'switched', 0, 'open');
    expect(on - CONTROL).toBeGreaterThan(0.1);
    expect(portBar(trace, 'td', '2', CONTROL - 0.01)).toBeLessThan(0.05);
    expect(portBar(trace, 'td', '2', on - 0.02)).toBeLessThan(0.05);
    expect(Math.abs(portBar(trace, 'td', '2', on + 0.2) - 6)).toBeLessThan(0.05);
  });

  it('a smaller timer throttle C gives a longer delay', () => {
    const fast = eventTime(timerRun('time-delay-valve-nc', 4e-10), 'td', 'switched', 0, 'open') - CONTROL;
    const slow = eventTime(timerRun('time-delay-valve-nc', 2e-10), 'td', 'switched', 0, 'open') - CONTROL;
    expect(slow).toBeGreaterThan(1.4 * fast);
  });

  it('never switches when the control air goes before the delay has run out', () => {
    const trace = timerRun('time-delay-valve-nc', 2e-10, CONTROL + 0.2);
    expect(eventsOf(trace, 'td', 'switched')).toEqual([]);
    expect(portBar(trace, 'td', '2', 2.45)).toBeLessThan(0.05);
  });
});
