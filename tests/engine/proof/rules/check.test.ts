import { describe, expect, it } from 'vitest';
import { checkRule, compileRulesText, longestWindowS } from '@/engine/proof/rules';
import type { Trace } from '@/engine/trace/trace';
import { handTrace, pulses, TENTHS, testDocument } from './fixtures';

const doc = testDocument();

function verdict(body: string, trace: Trace) {
  const { rules, errors } = compileRulesText(`rule "r": ${body}`, doc);
  expect(errors).toEqual([]);
  return checkRule(rules[0]!, trace);
}

/**
 * The truth of a formula at one sample k: button M is pressed at sample k only, and
 * `always (M is pressed implies F)` can fail only there. F and not F both passing means undecided.
 */
function truthAt(k: number, formula: string, columns: Record<string, number[]>): 'true' | 'false' | 'undecided' {
  const trace = handTrace(TENTHS, { 'm:operated': pulses(k), ...columns });
  const yes = verdict(`always (M is pressed implies (${formula}))`, trace).holds;
  const no = verdict(`always (M is pressed implies not (${formula}))`, trace).holds;
  if (yes && no) return 'undecided';
  return yes ? 'true' : 'false';
}

describe('atoms', () => {
  it('reads flags, cylinder positions and speeds with their tolerances', () => {
    // x: 0.5 mm is still retracted (≤ 0.5 mm); 0.6 mm is not. Stroke 100 mm: 99.5 mm counts as extended.
    const x = [0, 0.0005, 0.0006, 0.0995, 0.0994, 0, 0, 0, 0, 0, 0];
    // v: moving means more than 1 mm/s either way; exactly 1 mm/s is still.
    const v = [0, 0.001, 0.0011, -0.0011, -0.001, 0, 0, 0, 0, 0, 0];
    const columns = { 'cyl:x': x, 'cyl:v': v, 'a:operated': pulses(3) };
    expect([0, 1, 2].map((k) => truthAt(k, '1A1 is retracted', columns))).toEqual(['true', 'true', 'false']);
    expect([3, 4].map((k) => truthAt(k, '1A1 is extended', columns))).toEqual(['true', 'false']);
    expect([1, 2, 3].map((k) => truthAt(k, '1A1 is extending', columns))).toEqual(['false', 'true', 'false']);
    expect([3, 4].map((k) => truthAt(k, '1A1 is retracting', columns))).toEqual(['true', 'false']);
    expect([1, 2, 3, 4].map((k) => truthAt(k, '1A1 is moving', columns))).toEqual(['false', 'true', 'true', 'false']);
    expect([1, 2].map((k) => truthAt(k, '1A1 is still', columns))).toEqual(['true', 'false']);
    // position in mm against x in m: 99.5 mm ≥ 99 mm; = 99.4 mm holds within ±0.5 mm at 99.5 mm.
    expect(truthAt(3, '1A1 position >= 99 mm', columns)).toBe('true');
    expect(truthAt(3, '1A1 position = 99.1 mm', columns)).toBe('true');
    expect(truthAt(3, '1A1 position = 98.9 mm', columns)).toBe('false');
    // speed is the magnitude: 1.1 mm/s retracting is a speed above 1 mm/s.
    expect(truthAt(3, '1A1 speed > 1 mm/s', columns)).toBe('true');
    expect(truthAt(3, 'A is pressed', columns)).toBe('true');
    expect(truthAt(2, 'A is pressed', columns)).toBe('false');
    expect(truthAt(2, 'A is released', columns)).toBe('true');
    expect(truthAt(2, 'A is not released', columns)).toBe('false');
  });

  it('reads pressures as gauge against the ISO 8778 atmosphere of the drawing, and a vented port as 0 bar', () => {
    // 151 325 Pa absolute is 0.5 bar gauge against 101 325 Pa.
    const p = TENTHS.map(() => 151_325);
    const columns = { 'sup:p:2': p };
    expect(truthAt(0, 'pressure at 0Z1.2 >= 0.5 bar', columns)).toBe('true');
    expect(truthAt(0, 'pressure at 0Z1.2 < 0.5 bar', columns)).toBe('false');
    // = holds within ±0.05 bar.
    expect(truthAt(0, 'pressure at 0Z1.2 = 0.54 bar', columns)).toBe('true');
    expect(truthAt(0, 'pressure at 0Z1.2 = 0.56 bar', columns)).toBe('false');
    // 1V1's exhaust 5 has no tube: it vents to atmosphere, 0 bar, and the trace has no column for it.
    expect(truthAt(0, 'pressure at 1V1.5 = 0 bar', columns)).toBe('true');
  });

  it('reads valve positions by their state names, and a hand valve as pressed on side a', () => {
    // position index: 0 = a (actuated), 1 = b (rest).
    const columns = { 'v:position': [0, 1, 0, 1, 0, 1, 0, 1, 0, 1, 0], 'hand:position': pulses(1, 2) };
    expect(truthAt(0, '1V1 is a', columns)).toBe('true');
    expect(truthAt(1, '1V1 is a', columns)).toBe('false');
    expect(truthAt(1, '1V1 is b', columns)).toBe('true');
    expect(truthAt(0, '1V1 is switched', columns)).toBe('true');
    expect(truthAt(1, '1V1 is switched', columns)).toBe('false');
    // 3/2 NC: states [open, exhausting], rest index 1; pressed = in position 0 (open).
    expect(truthAt(1, '1S1 is pressed', columns)).toBe('false');
    expect(truthAt(3, '1S1 is pressed', columns)).toBe('true');
    expect(truthAt(3, '1S1 is open', columns)).toBe('true');
  });

  it('reads a semi-rotary actuator in degrees', () => {
    const quarter = Math.PI / 2;
    const columns = { 'rot:x': TENTHS.map((_, i) => (i === 0 ? 0 : quarter)), 'rot:v': TENTHS.map(() => 0) };
    expect(truthAt(0, '2A1 is at start', columns)).toBe('true');
    expect(truthAt(1, '2A1 is at end', columns)).toBe('true');
    expect(truthAt(1, '2A1 angle >= 89.9 deg', columns)).toBe('true');
    expect(truthAt(1, '2A1 is still', columns)).toBe('true');
  });
});

describe('boolean operators', () => {
  // A pressed at samples 1 and 3, B at 2 and 3.
  const columns = { 'a:operated': pulses(1, 3), 'b:operated': pulses(2, 3) };
  it.each([
    // sample: A, B
    [0, 'not A is pressed', 'true'], // A false
    [1, 'A is pressed and B is pressed', 'false'], // 1, 0
    [3, 'A is pressed and B is pressed', 'true'], // 1, 1
    [2, 'A is pressed or B is pressed', 'true'], // 0, 1
    [0, 'A is pressed or B is pressed', 'false'], // 0, 0
    [1, 'A is pressed implies B is pressed', 'false'], // 1 → 0
    [2, 'A is pressed implies B is pressed', 'true'], // 0 → anything
    [3, 'A is pressed implies B is pressed', 'true'], // 1 → 1
  ])('at sample %i: %s is %s', (k, formula, expected) => {
    expect(truthAt(k, formula, columns)).toBe(expected);
  });
});

describe('temporal operators', () => {
  it('always and never: the first failing sample is reported', () => {
    const trace = handTrace(TENTHS, { 'a:operated': pulses(4, 5) });
    const always = verdict('always A is released', trace);
    // A is pressed first at sample 4 (0.4 s).
    expect(always).toMatchObject({ holds: false, violatedAtS: 0.4 });
    expect(always.explanation).toBe('the condition A is released failed at 0.4 s');
    expect(verdict('never A is pressed', trace)).toMatchObject({ holds: false, violatedAtS: 0.4, explanation: 'A is pressed held at 0.4 s, which the rule forbids' });
    expect(verdict('never B is pressed', handTrace(TENTHS, { 'b:operated': pulses() }))).toMatchObject({ holds: true, violatedAtS: null, explanation: 'held over the whole run (0–1 s)' });
  });

  it('a plain atom at top level is checked at t = 0 only', () => {
    // A is released at 0 s and pressed later: the rule reads only the first sample.
    expect(verdict('A is released', handTrace(TENTHS, { 'a:operated': pulses(4) })).holds).toBe(true);
    expect(verdict('A is released', handTrace(TENTHS, { 'a:operated': pulses(0) }))).toMatchObject({ holds: false, violatedAtS: 0 });
  });

  it('eventually within T: window inclusive, undecided when it runs past the end', () => {
    // B pressed at sample 5 (0.5 s) only.
    const columns = { 'b:operated': pulses(5) };
    expect(truthAt(2, 'eventually within 0.3 s B is pressed', columns)).toBe('true'); // [0.2, 0.5] reaches 0.5 exactly
    expect(truthAt(1, 'eventually within 0.3 s B is pressed', columns)).toBe('false'); // [0.1, 0.4]
    expect(truthAt(5, 'eventually within 0 s B is pressed', columns)).toBe('true'); // now counts
    expect(truthAt(7, 'eventually within 0.3 s B is pressed', columns)).toBe('false'); // [0.7, 1.0] ends on the last sample: decided
    expect(truthAt(8, 'eventually within 0.3 s B is pressed', columns)).toBe('undecided'); // [0.8, 1.1] runs past 1.0
    expect(truthAt(8, 'eventually within 300 ms B is pressed', columns)).toBe('undecided');
  });

  it('eventually without a window looks to the end of the run', () => {
    const columns = { 'b:operated': pulses(5) };
    expect(truthAt(0, 'eventually B is pressed', columns)).toBe('true');
    expect(truthAt(6, 'eventually B is pressed', columns)).toBe('false'); // never again after 0.5 s
  });

  it('the end of the trace is not a violation (weak windows)', () => {
    const time = [0, 0.5, 1, 1.5, 2, 2.5, 3];
    const watch = 'always (A is pressed implies eventually within 2 s B is pressed)';
    // A at 1.5 s, B never: the 2 s window runs to 3.5 s, past the end (3 s): not reported.
    const open = verdict(watch, handTrace(time, { 'a:operated': [0, 0, 0, 1, 0, 0, 0], 'b:operated': [0, 0, 0, 0, 0, 0, 0] }));
    expect(open).toMatchObject({ holds: true, violatedAtS: null });
    expect(open.explanation).toBe('held over the whole run (0–3 s); a window that runs past the end of the trace was left undecided, not counted as a violation');
    // A at 0.5 s, B never: the window [0.5, 2.5] lies inside the run: violated at 0.5 s.
    const failed = verdict(watch, handTrace(time, { 'a:operated': [0, 1, 0, 0, 0, 0, 0], 'b:operated': [0, 0, 0, 0, 0, 0, 0] }));
    expect(failed).toMatchObject({ holds: false, violatedAtS: 0.5 });
    expect(failed.explanation).toBe('A is pressed at 0.5 s, but B is pressed did not follow within 2 s (by 2.5 s)');
    // Undecided stays undecided under not: never (eventually …) is not a violation at the end either.
    expect(verdict('never (A is pressed and not eventually within 2 s B is pressed)', handTrace(time, { 'a:operated': [0, 0, 0, 1, 0, 0, 0], 'b:operated': [0, 0, 0, 0, 0, 0, 0] })).holds).toBe(true);
  });

  it('once within T and historically within T look back, inclusive, cut at the start of the trace', () => {
    // A pressed at sample 2 (0.2 s) only.
    const once = { 'a:operated': pulses(2) };
    expect(truthAt(5, 'once within 0.3 s A is pressed', once)).toBe('true'); // [0.2, 0.5] reaches back to 0.2
    expect(truthAt(6, 'once within 0.3 s A is pressed', once)).toBe('false'); // [0.3, 0.6]
    expect(truthAt(2, 'once within 0 s A is pressed', once)).toBe('true'); // now counts
    expect(truthAt(1, 'once within 0.3 s A is pressed', once)).toBe('false'); // A comes later
    // A pressed at samples 0 … 1 and 3 … 6.
    const held = { 'a:operated': pulses(0, 1, 3, 4, 5, 6) };
    expect(truthAt(5, 'historically within 0.2 s A is pressed', held)).toBe('true'); // 0.3, 0.4, 0.5 all pressed
    expect(truthAt(4, 'historically within 0.2 s A is pressed', held)).toBe('false'); // 0.2 is in [0.2, 0.4]
    expect(truthAt(1, 'historically within 0.5 s A is pressed', held)).toBe('true'); // only 0 and 0.1 exist in [-0.4, 0.1]
  });

  it('until is strong: the right side must come, the left hold until then', () => {
    expect(truthAt(0, 'A is pressed until B is pressed', { 'a:operated': pulses(0, 1, 2, 3), 'b:operated': pulses(4) })).toBe('true');
    expect(truthAt(0, 'A is pressed until B is pressed', { 'a:operated': pulses(0, 1, 3), 'b:operated': pulses(4) })).toBe('false'); // A lapses at 0.2
    expect(truthAt(0, 'A is pressed until B is pressed', { 'a:operated': TENTHS.map(() => 1), 'b:operated': pulses() })).toBe('false'); // B never comes
    expect(truthAt(0, 'A is pressed until B is pressed', { 'a:operated': pulses(), 'b:operated': pulses(0) })).toBe('true'); // B at once
  });

  it('only after: each rising edge needs the cause within the window before, inclusive', () => {
    // B (the cause) at 0.2 s; A rises at 0.5 s and stays pressed to 0.7 s.
    const columns = { 'a:operated': pulses(5, 6, 7), 'b:operated': pulses(2) };
    expect(verdict('A is pressed only after B is pressed within 0.3 s', handTrace(TENTHS, columns)).holds).toBe(true); // 0.5 − 0.3 = 0.2: on the edge
    const late = verdict('A is pressed only after B is pressed within 0.2 s', handTrace(TENTHS, columns));
    // Only the edge at 0.5 s is judged; 0.6 and 0.7 are no new edges.
    expect(late).toMatchObject({ holds: false, violatedAtS: 0.5, explanation: 'A became pressed at 0.5 s without B is pressed in the 0.2 s before' });
    // A already pressed at the first sample is an edge there.
    const first = verdict('A is pressed only after B is pressed within 1 s', handTrace(TENTHS, { 'a:operated': pulses(0, 1), 'b:operated': pulses(5) }));
    expect(first).toMatchObject({ holds: false, violatedAtS: 0 });
    // ... which the cause at the same sample satisfies.
    expect(verdict('A is pressed only after B is pressed within 1 s', handTrace(TENTHS, { 'a:operated': pulses(0, 1), 'b:operated': pulses(0) })).holds).toBe(true);
  });

  it('together within T: all hold now, and each was off within the window', () => {
    // A pressed from 0.1 s, B from 0.5 s: A was off at 0.0, exactly 0.5 s before 0.5.
    const inTime = { 'a:operated': pulses(1, 2, 3, 4, 5, 6), 'b:operated': pulses(5, 6) };
    expect(truthAt(5, 'together within 0.5 s (A is pressed, B is pressed)', inTime)).toBe('true');
    expect(truthAt(5, 'together within 0.4 s (A is pressed, B is pressed)', inTime)).toBe('false'); // A was last off 0.5 s before
    expect(truthAt(4, 'together within 0.5 s (A is pressed, B is pressed)', inTime)).toBe('false'); // B not yet pressed
    // A held from the first sample was never off: no synchronous start.
    expect(truthAt(5, 'together within 1 s (A is pressed, B is pressed)', { 'a:operated': pulses(0, 1, 2, 3, 4, 5), 'b:operated': pulses(5) })).toBe('false');
  });

  it('exclusive: at most one at every sample', () => {
    const trace = handTrace(TENTHS, { 'a:operated': pulses(1, 4), 'b:operated': pulses(2, 4), 'c:operated': pulses(3) });
    const result = verdict('exclusive (A is pressed, B is pressed, C is pressed)', trace);
    // Samples 1, 2, 3 each have one; sample 4 (0.4 s) has A and B.
    expect(result).toMatchObject({ holds: false, violatedAtS: 0.4, explanation: 'A is pressed and B is pressed held at the same time at 0.4 s' });
    expect(verdict('exclusive (A is pressed, C is pressed)', trace).holds).toBe(true);
  });
});

describe('checkRule: edge cases', () => {
  it('an empty trace has nothing to check', () => {
    expect(verdict('always A is released', handTrace([], { 'a:operated': [] }))).toMatchObject({ holds: true, violatedAtS: null, explanation: 'the trace has no samples, so nothing was checked' });
  });

  it('a signal missing from the trace is reported, not taken as a pass', () => {
    const result = verdict('always A is released', handTrace(TENTHS, { 'b:operated': pulses() }));
    expect(result).toMatchObject({ holds: false, violatedAtS: null });
    expect(result.explanation).toContain("no signal 'a:operated'");
  });

  it('reports a top-level and at its earliest failing part', () => {
    const trace = handTrace(TENTHS, { 'a:operated': pulses(6), 'b:operated': pulses(3) });
    expect(verdict('(never A is pressed) and (never B is pressed)', trace)).toMatchObject({ holds: false, violatedAtS: 0.3 });
  });

  it('is linear in the trace length: 60 000 samples with 30 s windows', () => {
    const n = 60_000;
    const time = Array.from({ length: n }, (_, i) => i * 0.001);
    const a = time.map((t) => (Math.floor(t) % 2 === 0 ? 1 : 0));
    const trace = handTrace(time, { 'a:operated': a, 'b:operated': a });
    const started = performance.now();
    // A window of 30 000 samples: an O(n·window) checker would take seconds here.
    const result = verdict('always ((A is pressed) implies (once within 30 s B is pressed and eventually within 30 s B is released and historically within 30 s not C is pressed))', handTrace(time, { ...Object.fromEntries(trace.signals.map((s) => [s.name, s.values])), 'c:operated': time.map(() => 0) }));
    expect(result.holds).toBe(true);
    expect(performance.now() - started).toBeLessThan(1500);
  });
});

describe('longestWindowS', () => {
  it('is the farthest reach of any rule, windows nested inside one another added up', () => {
    const { rules } = compileRulesText(
      ['rule "a": A is pressed only after together within 0.5 s (A is pressed, B is pressed) within 0.3 s', 'rule "b": always (A is pressed implies eventually within 2 s 1A1 is extended)', 'rule "c": never A is pressed'].join('\n'),
      doc,
    );
    expect(rules).toHaveLength(3);
    expect(longestWindowS(rules)).toBe(2);
    // `only after … within 0.3 s` looks back 0.3 s for `together within 0.5 s`, which looks back 0.5 s more.
    expect(longestWindowS(rules.slice(0, 1))).toBeCloseTo(0.8, 12);
    expect(longestWindowS(rules.slice(2))).toBe(0);
  });
});
