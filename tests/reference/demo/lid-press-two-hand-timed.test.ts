import { describe, expect, it } from 'vitest';
import type { InputEvent } from '@/engine/solver/simulate';
import type { Trace } from '@/engine/trace/trace';
import { run, values } from '../solver/helpers';
import { demoDocument, demoInputs } from '@/tests/support/demo-circuits';

/**
 * The timed two-hand demo against the two-hand control rules of ISO 13851 (synchronous actuation:
 * both hands within 0.5 s of each other; a new output only after both hands were released).
 * The circuit: S1 → K1, S2 → K2; K1 or K2 energise window timer KT1 (0.5 s on-delay); K3 picks
 * up through K1, K2 and KT1's NC contact and holds itself through K1, K2; K3 drives 1M1.
 */

const document = demoDocument('lid-press-two-hand-timed');

const press = (t: number, component: string): InputEvent => ({ t, component, action: 'press' });
const release = (t: number, component: string): InputEvent => ({ t, component, action: 'release' });

const simulateInputs = (inputs: InputEvent[], untilS: number) => run(document, inputs, { untilS, intervalS: 0.01 });

/** Times at which the lid press (component `press`) started out or in. */
const starts = (trace: Trace, direction: 'extending' | 'retracting') =>
  trace.events.filter((e) => e.componentId === 'press' && e.kind === 'started' && e.detail === direction).map((e) => e.t);
const arrivals = (trace: Trace, end: 'extended' | 'retracted') =>
  trace.events.filter((e) => e.componentId === 'press' && e.kind === 'end-position' && e.detail === end).map((e) => e.t);

describe('lid press, timed two-hand start (ISO 13851 synchronous actuation and re-initiation)', () => {
  it('the stored good stroke extends and retracts the press', () => {
    const inputs = demoInputs('lid-press-two-hand-timed');
    const trace = simulateInputs(inputs, 4);
    expect(arrivals(trace, 'extended')).toHaveLength(1);
    expect(arrivals(trace, 'retracted')).toHaveLength(1);
  });

  it('both hands 0.1 s apart: 1A1 extends; both released: it retracts', () => {
    const trace = simulateInputs([press(0.2, 'S1'), press(0.3, 'S2'), release(2.0, 'S1'), release(2.0, 'S2')], 4);
    const [extending] = starts(trace, 'extending');
    expect(extending).toBeGreaterThan(0.3);
    expect(extending).toBeLessThan(0.6);
    expect(arrivals(trace, 'extended')).toHaveLength(1);
    expect(starts(trace, 'retracting')[0]).toBeGreaterThan(2.0);
    expect(arrivals(trace, 'retracted')).toHaveLength(1);
    expect(values(trace, 'press:x').at(-1)).toBe(0);
  });

  it('within the window (0.4 s apart) it strokes; past it (0.6 s, 2 s apart) 1A1 does not move', () => {
    expect(arrivals(simulateInputs([press(0.2, 'S1'), press(0.6, 'S2')], 2), 'extended')).toHaveLength(1);
    for (const late of [0.8, 2.2]) {
      const trace = simulateInputs([press(0.2, 'S1'), press(late, 'S2')], late + 1.5);
      expect(starts(trace, 'extending'), `S2 at ${late} s`).toEqual([]);
      expect(Math.max(...values(trace, 'press:x')), `S2 at ${late} s`).toBe(0);
      expect(trace.events.some((e) => e.componentId === 'm1' && e.kind === 'energised'), `S2 at ${late} s`).toBe(false);
    }
  });

  it('S1 held, S2 released and pressed again at once: no new stroke until both were released', () => {
    const trace = simulateInputs(
      [
        press(0.2, 'S1'),
        press(0.3, 'S2'),
        // S2 let go and pressed again 0.2 s later, inside what would be a fresh 0.5 s window.
        release(2.0, 'S2'),
        press(2.2, 'S2'),
        // Both released, then both pressed together: a legitimate new stroke.
        release(4.0, 'S1'),
        release(4.0, 'S2'),
        press(4.5, 'S1'),
        press(4.5, 'S2'),
      ],
      6.5,
    );
    const out = starts(trace, 'extending');
    expect(out).toHaveLength(2);
    expect(out[0]).toBeLessThan(0.6);
    expect(out[1]).toBeGreaterThan(4.5);
    // Releasing S2 alone drops K3: the press returns and stays back through the re-press.
    const back = starts(trace, 'retracting');
    expect(back[0]).toBeGreaterThan(2.0);
    expect(back[0]).toBeLessThan(2.2);
    const x = values(trace, 'press:x');
    const during = trace.time.flatMap((t, i) => (t > 2.6 && t < 4.5 ? [x[i]!] : []));
    expect(Math.max(...during)).toBe(0);
    expect(arrivals(trace, 'extended')).toHaveLength(2);
  });
});
