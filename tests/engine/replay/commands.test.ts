import { describe, expect, it } from 'vitest';
import type { CircuitDocument } from '@/engine/document/schema';
import { commandsToInputs, ReplayError, replayLog, type RecordedLog, type RecordedSignal } from '@/engine/replay';
import { demoDocument } from '@/tests/support/demo-circuits';

/** The relay-controlled lid press plus loose parts of every kind a command can name (no wiring: only their types matter here). */
const doc: CircuitDocument = (() => {
  const base = demoDocument('lid-press-relay-control');
  const like = base.components[0]!;
  const extra = (id: string, tag: string, type: string, parameters: Record<string, string> = {}) => ({ ...like, id, tag, type, parameters });
  return {
    ...base,
    components: [
      ...base.components,
      extra('sel', 'S3', 'selector-switch'),
      extra('lever', 'S4', 'valve-3-2-nc', { actuation: 'lever-detent' }),
      extra('button', 'S5', 'valve-3-2-nc', { actuation: 'pushbutton' }),
      extra('cam', 'S6', 'valve-3-2-nc', { actuation: 'roller' }),
    ],
  };
})();

const command = (tag: string, word: string, times: number[], values: number[]): RecordedSignal => ({ tag, word, role: 'command', kind: 'state', times, values });
const log = (...signals: RecordedSignal[]): RecordedLog => ({ signals, durationS: 5 });
const brief = (inputs: ReturnType<typeof commandsToInputs>) => inputs.map((i) => [i.t, i.component, i.action, ...(i.value === undefined ? [] : [i.value])]);

describe('commandsToInputs', () => {
  it('presses and releases a momentary push-button on its edges, ignoring repeated samples', () => {
    const inputs = commandsToInputs(log(command('S1', 'pressed', [0, 0.2, 0.3, 0.4, 1.5], [0, 1, 1, 0, 0])), doc);
    expect(brief(inputs)).toEqual([
      [0.2, 'S1', 'press'],
      [0.4, 'S1', 'release'],
    ]);
  });

  it("reads 'released' the other way round", () => {
    const inputs = commandsToInputs(log(command('S2', 'released', [0, 1, 2], [1, 0, 1])), doc);
    expect(brief(inputs)).toEqual([
      [1, 'S2', 'press'],
      [2, 'S2', 'release'],
    ]);
  });

  it('toggles a latching selector switch and a detented lever valve on every change of state', () => {
    const inputs = commandsToInputs(log(command('S3', 'pressed', [0, 1, 2], [0, 1, 0]), command('S4', 'pressed', [0, 1.5, 2.5], [0, 1, 0])), doc);
    expect(brief(inputs)).toEqual([
      [1, 'S3', 'toggle'],
      [1.5, 'S4', 'toggle'],
      [2, 'S3', 'toggle'],
      [2.5, 'S4', 'toggle'],
    ]);
  });

  it('strikes an emergency stop and resets it with a toggle (a twist or pull)', () => {
    const inputs = commandsToInputs(log(command('S0', 'struck', [0, 1, 3], [0, 1, 0])), doc);
    expect(brief(inputs)).toEqual([
      [1, 'S0', 'press'],
      [3, 'S0', 'toggle'],
    ]);
  });

  it('presses a push-button valve by hand', () => {
    expect(brief(commandsToInputs(log(command('S5', 'pressed', [0.1, 0.6], [1, 0])), doc))).toEqual([
      [0.1, 'S5', 'press'],
      [0.6, 'S5', 'release'],
    ]);
  });

  it('sets a solenoid coil 1/0, and counts a command already active at the first sample as acting then', () => {
    const inputs = commandsToInputs(log(command('1M1', 'energised', [0, 2], [1, 0]), command('1M1', 'off', [0.5, 1], [0, 1])), doc);
    expect(brief(inputs)).toEqual([
      [0, '1M1', 'set', 1],
      [0.5, '1M1', 'set', 1],
      [1, '1M1', 'set', 0],
      [2, '1M1', 'set', 0],
    ]);
  });

  it('keeps the order of the columns for simultaneous inputs', () => {
    const inputs = commandsToInputs(log(command('S2', 'pressed', [0, 1], [0, 1]), command('S1', 'pressed', [0, 1], [0, 1])), doc);
    expect(inputs.map((i) => i.component)).toEqual(['S2', 'S1']);
  });

  it('leaves observations alone', () => {
    const observed: RecordedSignal = { ...command('1B2', 'on', [0, 1], [0, 1]), role: 'observation' };
    expect(commandsToInputs(log(observed), doc)).toEqual([]);
  });

  it.each([
    ['an unknown tag', command('9S9', 'pressed', [0], [1]), /9S9.*no component tagged '9S9'/],
    ['a sensor', command('1B2', 'on', [0], [1]), /1B2 'on'.*observation/],
    ['a roller valve', command('S6', 'pressed', [0], [1]), /S6 'pressed'.*observation/],
    ['a relay coil', command('K1', 'energised', [0], [1]), /K1 'energised'/],
    ['a wrong word for a button', command('S1', 'energised', [0], [1]), /S1 'energised'.*pressed, released/],
    ['a wrong word for a coil', command('1M1', 'pressed', [0], [1]), /1M1 'pressed'.*energised/],
    ['a number', { ...command('S1', 'pressed', [0], [1]), kind: 'number' as const }, /S1 'pressed'.*0\/1 state/],
  ])('refuses %s with a message naming the tag and word', (_, signal, message) => {
    expect(() => commandsToInputs(log(signal), doc)).toThrow(ReplayError);
    expect(() => commandsToInputs(log(signal), doc)).toThrow(message);
  });
});

describe('replayLog', () => {
  it('drives the drawing with the commands to the end of the log plus the settle time, every 10 ms', () => {
    const press = demoDocument('lid-press-relay-control');
    const { trace, inputs } = replayLog(press, { durationS: 2, signals: [command('S1', 'pressed', [0, 0.2, 0.4], [0, 1, 0])] });
    expect(inputs).toHaveLength(2);
    expect(trace.intervalS).toBe(0.01);
    expect(trace.time[trace.time.length - 1]).toBeCloseTo(2.5, 6);
    const x = trace.signals.find((s) => s.name === 'press:x')!.values;
    // S1 starts the stroke through K1 and 1M1: the press reaches its 100 mm end within the log.
    expect(Math.max(...x)).toBeGreaterThan(0.099);
    expect(x[0]).toBeLessThan(0.0005);
  });

  it('says why when the drawing does not compile', () => {
    const press = demoDocument('lid-press-relay-control');
    const broken = { ...press, wires: [...press.wires, { ...press.wires[0]!, id: 'bad', to: { component: 'main', terminal: '1' } }] } as CircuitDocument;
    expect(() => replayLog(broken, { durationS: 1, signals: [] })).toThrow(/does not compile/);
  });
});
