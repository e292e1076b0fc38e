import { describe, expect, it } from 'vitest';
import type { CircuitDocument } from '@/engine/document/schema';
import { describeVariations, runProofSearch, type SearchCheck, type SearchResult, type SearchSpec } from '@/engine/proof/search';
import { signal, type Trace } from '@/engine/trace/trace';
import { TestCircuit } from '../../support/circuit';
import { demoDocument } from '@/tests/support/demo-circuits';

/** A rule over one signal: it must never exceed a level. */
function never(name: string, signalName: string, level: number): SearchCheck {
  return (trace: Trace) => {
    const values = signal(trace, signalName)!.values;
    const k = values.findIndex((v) => v > level);
    return [{ name, holds: k < 0, violatedAtS: k < 0 ? null : trace.time[k]!, explanation: k < 0 ? '' : `${signalName} reached ${values[k]}` }];
  };
}

const withoutTime = (r: SearchResult) => ({ ...r, elapsedS: 0 });

/** Buttons S1…Sn, each lighting its own lamp: the state is just which buttons are held. */
function buttonsAndLamps(n: number): CircuitDocument {
  let c = new TestCircuit().add('ps', 'dc-supply');
  for (let i = 1; i <= n; i += 1) c = c.add(`S${i}`, 'pushbutton-no').add(`H${i}`, 'indicator-lamp').wire('ps:L+', `S${i}:13`).wire(`S${i}:14`, `H${i}:X1`).wire(`H${i}:X2`, 'ps:M');
  return c.build();
}
const buttons = (n: number) => Array.from({ length: n }, (_, i) => ({ tag: `S${i + 1}`, kind: 'button' as const }));
const alwaysHolds: SearchCheck = () => [{ name: 'nothing', holds: true, violatedAtS: null, explanation: '' }];

describe('proof search', () => {
  const twoHand = demoDocument('lid-press-two-hand');
  const twoHandSpec = (steps: number): SearchSpec => ({ document: twoHand, variations: [{ tag: '1S1', kind: 'button' }, { tag: '1S2', kind: 'button' }], quantumS: 0.25, steps, settleS: 1, historyS: 0 });

  it('finds the shortest counterexample: the two-hand press extends at level 1 with both buttons pressed at once', async () => {
    const result = await runProofSearch(twoHandSpec(4), never('press never extends', 'press:x', 0.09));
    expect(result.complete).toBe(true);
    // Level 1 runs {}, {1S1}, {1S2}, {1S1, 1S2}: the last fails, and with every rule failed the search stops.
    expect(result.sequences).toBe(4);
    expect(result.levels).toBe(1);
    const [rule] = result.rules;
    expect(rule!.status).toBe('failed');
    expect(rule!.counterexample!.level).toBe(1);
    expect(rule!.counterexample!.inputs).toEqual([
      { t: 0, component: '1S1', action: 'press' },
      { t: 0, component: '1S2', action: 'press' },
    ]);
    expect(rule!.counterexample!.violatedAtS).toBeGreaterThan(0);
    expect(rule!.counterexample!.violatedAtS).toBeLessThan(rule!.counterexample!.untilS);
  });

  it('a timing rule fails first at level 2 with the fewest input changes: one button, then the other a quantum later', async () => {
    // Two-hand control in the spirit of ISO 13851: presses more than 0.2 s apart must not start the press.
    const apart: SearchCheck = (trace) => {
      const press = (id: string) => trace.events.find((e) => e.componentId === id && e.kind === 'input-press')?.t;
      const [l, r] = [press('left'), press('right')];
      const x = signal(trace, 'press:x')!.values;
      const k = x.findIndex((v) => v > 0.09);
      const broken = l !== undefined && r !== undefined && Math.abs(l - r) > 0.2 && k >= 0;
      return [{ name: 'presses apart never start it', holds: !broken, violatedAtS: broken ? trace.time[k]! : null, explanation: broken ? 'started after presses apart' : '' }];
    };
    const result = await runProofSearch(twoHandSpec(4), apart);
    const example = result.rules[0]!.counterexample!;
    expect(example.level).toBe(2);
    expect(example.inputs).toEqual([
      { t: 0, component: '1S1', action: 'press' },
      { t: 0.25, component: '1S2', action: 'press' },
    ]);
    expect(example.untilS).toBeCloseTo(1.5, 12);
  });

  it('dedup: buttons alone have 4 states, met at level 1, so level 2 expands nothing (20 paths, not 4 + 16 + 64)', async () => {
    const result = await runProofSearch({ document: buttonsAndLamps(2), variations: buttons(2), quantumS: 0.1, steps: 3, settleS: 0.1, historyS: 0 }, alwaysHolds);
    expect(result).toMatchObject({ complete: true, sequences: 20, states: 4, levels: 2 });
    expect(result.rules).toEqual([{ name: 'nothing', status: 'passed', sequences: 20, states: 4, counterexample: null }]);
  });

  it('dedup with history: a rule looking back one quantum tells "just changed" apart, giving 16 states and 68 paths (not 340)', async () => {
    // Per button: held or not × changed a quantum ago or earlier (the cap) = 4, so 16 states; level 1
    // meets 4 of them, level 2 the other 12 (16 paths), level 3 expands those 12 into 48 paths and meets nothing new.
    const result = await runProofSearch({ document: buttonsAndLamps(2), variations: buttons(2), quantumS: 0.1, steps: 4, settleS: 0.1, historyS: 0.1 }, alwaysHolds);
    expect(result).toMatchObject({ complete: true, sequences: 4 + 16 + 48, states: 16, levels: 3 });
  });

  it('stops between batches when asked, and says the result is incomplete', async () => {
    let asked = 0;
    const progress: number[] = [];
    const result = await runProofSearch({ document: buttonsAndLamps(3), variations: buttons(3), quantumS: 0.1, steps: 3, settleS: 0.1, historyS: 0 }, alwaysHolds, {
      shouldStop: () => (asked += 1) >= 1,
      onProgress: (p) => progress.push(p.done),
    });
    expect(result.complete).toBe(false);
    // Level 1 is one batch of the 2³ subsets.
    expect(result.sequences).toBe(8);
    expect(result.levels).toBe(1);
    expect(progress).toEqual([8]);
  });

  it('is deterministic: the same spec gives the same result', async () => {
    const check = never('press never extends', 'press:x', 0.2);
    const a = await runProofSearch(twoHandSpec(3), check);
    const b = await runProofSearch(twoHandSpec(3), check);
    expect(withoutTime(a)).toEqual(withoutTime(b));
    expect(a.sequences).toBeGreaterThan(4);
  });

  it('rejects a variation the drawing does not offer, naming it', async () => {
    await expect(runProofSearch({ ...twoHandSpec(2), variations: [{ tag: '1A1', kind: 'button' }, { tag: '9X9', kind: 'power-loss' }] }, alwaysHolds)).rejects.toThrow(
      /1A1 cannot vary as button.*no component tagged 9X9/,
    );
  });

  it('lists what a drawing offers to vary', () => {
    const offered = describeVariations(demoDocument('lid-press-relay-control'));
    expect(offered.map((v) => [v.tag, v.kinds])).toEqual([
      ['0Z1', ['supply-loss']],
      ['G1', ['power-loss']],
      ['S0', ['button']],
      ['S2', ['button']],
      ['S1', ['button']],
      ['1B2', ['sensor-stuck-on', 'sensor-stuck-off']],
    ]);
  });

  it('covers 4 variations × 8 quanta of the relay-controlled press, and finds the one rule that breaks', async () => {
    const document = demoDocument('lid-press-relay-control');
    const estopHolds: SearchCheck = (trace) => {
      const struck = signal(trace, 'estop:operated')!.values;
      const coil = signal(trace, 'm1:energised')!.values;
      const k = struck.findIndex((s, i) => s === 1 && coil[i] === 1);
      return [
        { name: 'solenoid off while the emergency stop is struck', holds: k < 0, violatedAtS: k < 0 ? null : trace.time[k]!, explanation: '' },
        ...never('press never extends', 'press:x', 0.09)(trace),
      ];
    };
    // Settle 0.5 s (not 1 s) keeps this test near 10 s on the shared 2-core machine.
    const variations = [{ tag: 'S1', kind: 'button' }, { tag: 'S2', kind: 'button' }, { tag: 'S0', kind: 'button' }, { tag: 'G1', kind: 'power-loss' }] as const;
    const result = await runProofSearch({ document, variations: [...variations], quantumS: 0.25, steps: 8, settleS: 0.5, historyS: 0 }, estopHolds);
    expect(result.complete).toBe(true);
    expect(result.levels).toBe(8);
    // Without pruning, level 8 alone would hold more than 8^8 ≈ 16.8 million paths (8 subsets of the three buttons at each quantum).
    expect(result.sequences).toBeLessThan(10_000);
    expect(result.states).toBeGreaterThan(50);
    const [estop, extends_] = result.rules;
    expect(estop).toMatchObject({ status: 'passed', sequences: result.sequences, states: result.states, counterexample: null });
    expect(extends_!.status).toBe('failed');
    expect(extends_!.counterexample!.inputs).toEqual([{ t: 0, component: 'S1', action: 'press' }]);
  }, 60_000);
});
