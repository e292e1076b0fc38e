import { produce, produceWithPatches, enablePatches } from 'immer';
import { describe, expect, it } from 'vitest';
import { addComponent, connect } from '@/components/editor/document-commands';
import { parameterEditLabel, setLabel, setNotes, setParameter, setSettings, setTag, setTube, tagProblem, type CommandResult } from '@/components/editor/inspector-commands';
import { componentTypeById } from '@/engine/components/registry';
import { circuitDocumentSchema, emptyDocument, type CircuitDocument } from '@/engine/document/schema';

enablePatches();

function circuit() {
  const ids: string[] = [];
  let tubeId = '';
  const doc = produce(emptyDocument(), (d) => {
    for (const type of ['valve-5-2', 'cylinder-double-acting', 'relay-coil', 'relay-contact-no']) ids.push(addComponent(d, type, { x: 0, y: 0 }));
    const tube = connect(d, { component: ids[0]!, port: '4' }, { component: ids[1]!, port: 'A' });
    if (!tube.ok) throw new Error(tube.reason);
    tubeId = tube.id;
  });
  const [valve, cylinder, coil, contact] = ids as [string, string, string, string];
  return { doc, valve, cylinder, coil, contact, tubeId };
}

/** Runs a recipe as the editor store does, returning the new document, its result and whether anything changed. */
function run<T>(doc: CircuitDocument, recipe: (draft: CircuitDocument) => T) {
  let result!: T;
  const [next, patches] = produceWithPatches(doc, (draft) => {
    result = recipe(draft as CircuitDocument);
  });
  return { next, result, changed: patches.length > 0 };
}

const refused = (result: CommandResult) => (result.ok ? null : result.reason);

describe('setParameter', () => {
  const { doc, valve, cylinder } = circuit();

  it('stores a changed value in SI and leaves the other parameters alone', () => {
    const { next, result } = run(doc, (d) => setParameter(d, valve, 'switchTime', 0.03));
    expect(result).toEqual({ ok: true });
    expect(next.components.find((c) => c.id === valve)!.parameters).toEqual({ switchTime: 0.03 });
  });

  it('removes the value when it is set back to the default, so the document lists only changes', () => {
    const changed = run(doc, (d) => setParameter(d, valve, 'switchTime', 0.03)).next;
    const { next, changed: edited } = run(changed, (d) => setParameter(d, valve, 'switchTime', 0.015));
    expect(edited).toBe(true);
    expect(next.components.find((c) => c.id === valve)!.parameters).toEqual({});
    // Setting the default on a component that has none stored is no edit at all (no undo step).
    expect(run(doc, (d) => setParameter(d, valve, 'switchTime', 0.015)).changed).toBe(false);
  });

  it('handles choices, flags and tag references', () => {
    let next = run(doc, (d) => setParameter(d, valve, 'actuation', 'solenoid')).next;
    next = run(next, (d) => setParameter(d, valve, 'manualOverride', false)).next;
    expect(next.components.find((c) => c.id === valve)!.parameters).toEqual({ actuation: 'solenoid', manualOverride: false });
    const contact = next.components.find((c) => c.type === 'relay-contact-no')!.id;
    next = run(next, (d) => setParameter(d, contact, 'coil', ' K2 ')).next;
    expect(next.components.find((c) => c.id === contact)!.parameters).toEqual({ coil: 'K2' });
  });

  it('refuses values outside the range, of the wrong kind or for an unknown parameter, leaving the document untouched', () => {
    const cases: Array<[string, string, number | string | boolean, RegExp]> = [
      [valve, 'pilotThreshold', 5_000, /between 0\.1 and 10 bar \(gauge\)/],
      [valve, 'switchTime', Number.NaN, /Switching time must be between 0 and 2 s/],
      [valve, 'actuation', 'telepathy', /one of pushbutton/],
      [valve, 'manualOverride', 'yes', /on or off/],
      [valve, 'bore', 0.05, /has no parameter/],
      [cylinder, 'stroke', '0.1', /must be a number/],
      ['no-such-id', 'stroke', 0.1, /no longer in the circuit/],
    ];
    for (const [id, name, value, reason] of cases) {
      const { result, changed } = run(doc, (d) => setParameter(d, id, name, value));
      expect(refused(result), name).toMatch(reason);
      expect(changed, name).toBe(false);
    }
  });

  it('accepts only whole counts', () => {
    const counter = produce(emptyDocument(), (d) => void addComponent(d, 'counter', { x: 0, y: 0 }));
    const id = counter.components[0]!.id;
    expect(refused(run(counter, (d) => setParameter(d, id, 'preset', 2.5)).result)).toMatch(/whole number/);
    expect(run(counter, (d) => setParameter(d, id, 'preset', 5)).next.components[0]!.parameters).toEqual({ preset: 5 });
  });

  it('keeps the document valid against its schema', () => {
    const { next } = run(doc, (d) => setParameter(d, cylinder, 'bore', 0.05));
    expect(circuitDocumentSchema.safeParse(next).success).toBe(true);
  });
});

describe('setTag', () => {
  const { doc, valve, coil } = circuit();

  it('renames, dropping surrounding spaces', () => {
    const { next, result } = run(doc, (d) => setTag(d, valve, '  2V1 '));
    expect(result).toEqual({ ok: true });
    expect(next.components.find((c) => c.id === valve)!.tag).toBe('2V1');
  });

  it('refuses a tag another component has, whatever its case, and names that component', () => {
    const { result, changed } = run(doc, (d) => setTag(d, valve, 'k1'));
    expect(refused(result)).toBe('K1 already names another component (Relay coil).');
    expect(changed).toBe(false);
  });

  it('lets a component change the case of its own tag', () => {
    expect(run(doc, (d) => setTag(d, coil, 'k1')).next.components.find((c) => c.id === coil)!.tag).toBe('k1');
  });

  it("carries a rename to the parts that name it: a relay's contacts follow their coil, a solenoid follows its valve", () => {
    const { doc: withSolenoid, contact } = circuit();
    const solenoidDoc = produce(withSolenoid, (d) => void addComponent(d, 'solenoid-coil', { x: 0, y: 0 }));
    const solenoid = solenoidDoc.components.at(-1)!.id;
    // Both rely on their defaults (K1, 1V1), which name the coil and the valve placed first.
    expect(solenoidDoc.components.find((c) => c.id === contact)!.parameters.coil).toBeUndefined();
    const renamed = run(run(solenoidDoc, (d) => setTag(d, coil, 'K7')).next, (d) => setTag(d, valve, '2V1')).next;
    expect(renamed.components.find((c) => c.id === contact)!.parameters.coil).toBe('K7');
    expect(renamed.components.find((c) => c.id === solenoid)!.parameters.valve).toBe('2V1');
    // A part that named something else keeps its reference.
    const elsewhere = run(produce(solenoidDoc, (d) => void (d.components.find((c) => c.id === contact)!.parameters.coil = 'K9')), (d) => setTag(d, coil, 'K7')).next;
    expect(elsewhere.components.find((c) => c.id === contact)!.parameters.coil).toBe('K9');
  });

  it('refuses an empty or overlong tag', () => {
    expect(refused(run(doc, (d) => setTag(d, valve, '   ')).result)).toBe('Enter a tag.');
    expect(refused(run(doc, (d) => setTag(d, valve, 'X'.repeat(17))).result)).toBe('A tag has at most 16 characters.');
    expect(tagProblem(doc, valve, 'X'.repeat(16))).toBeNull();
  });
});

describe('setLabel', () => {
  const { doc, cylinder } = circuit();

  it('sets a trimmed label and removes it when emptied', () => {
    const labelled = run(doc, (d) => setLabel(d, cylinder, ' Clamp ')).next;
    expect(labelled.components.find((c) => c.id === cylinder)!.label).toBe('Clamp');
    const cleared = run(labelled, (d) => setLabel(d, cylinder, '')).next;
    expect('label' in cleared.components.find((c) => c.id === cylinder)!).toBe(false);
  });

  it('refuses a label longer than the document allows', () => {
    const { result, changed } = run(doc, (d) => setLabel(d, cylinder, 'x'.repeat(121)));
    expect(refused(result)).toMatch(/at most 120 characters/);
    expect(changed).toBe(false);
  });
});

describe('setNotes', () => {
  const { doc, cylinder } = circuit();

  it('keeps notes over several lines, trimmed, and removes them when emptied', () => {
    const noted = run(doc, (d) => setNotes(d, cylinder, '  Cushion set for the 4 kg lid.\nCheck after a seal change.  ')).next;
    expect(noted.components.find((c) => c.id === cylinder)!.notes).toBe('Cushion set for the 4 kg lid.\nCheck after a seal change.');
    expect(circuitDocumentSchema.safeParse(noted).success).toBe(true);
    const cleared = run(noted, (d) => setNotes(d, cylinder, '  ')).next;
    expect('notes' in cleared.components.find((c) => c.id === cylinder)!).toBe(false);
  });

  it('refuses notes longer than the document allows', () => {
    const { result, changed } = run(doc, (d) => setNotes(d, cylinder, 'x'.repeat(2001)));
    expect(refused(result)).toMatch(/at most 2000 characters/);
    expect(changed).toBe(false);
  });
});

describe('setTube', () => {
  const { doc, tubeId } = circuit();

  it('changes only the sizes given', () => {
    const tube = run(doc, (d) => setTube(d, tubeId, { innerDiameterM: 0.006 })).next.tubes[0]!;
    expect([tube.lengthM, tube.innerDiameterM]).toEqual([0.5, 0.006]);
  });

  it('refuses sizes outside the limits, with the range in display units', () => {
    expect(refused(run(doc, (d) => setTube(d, tubeId, { lengthM: 0 })).result)).toBe('Tube length must be between 0.001 and 1000 m.');
    expect(refused(run(doc, (d) => setTube(d, tubeId, { lengthM: 1, innerDiameterM: 0.3 })).result)).toBe('Inner diameter must be between 0.5 and 200 mm.');
    // Nothing changes when one of two sizes is refused.
    expect(run(doc, (d) => setTube(d, tubeId, { lengthM: 1, innerDiameterM: 0.3 })).changed).toBe(false);
    expect(refused(run(doc, (d) => setTube(d, 'gone', { lengthM: 1 })).result)).toMatch(/no longer in the circuit/);
  });
});

describe('setSettings', () => {
  const doc = emptyDocument();

  it('changes ambient pressure and temperature', () => {
    const { next } = run(doc, (d) => setSettings(d, { ambientPressurePa: 95_000 }));
    expect(next.settings).toEqual({ ambientPressurePa: 95_000, ambientTemperatureK: 293.15 });
    expect(run(next, (d) => setSettings(d, { ambientTemperatureK: 303.15 })).next.settings.ambientTemperatureK).toBe(303.15);
  });

  it('refuses values that are unit mix-ups', () => {
    expect(refused(run(doc, (d) => setSettings(d, { ambientPressurePa: 6 })).result)).toBe('Ambient pressure must be between 0.3 and 1.2 bar (absolute).');
    expect(refused(run(doc, (d) => setSettings(d, { ambientTemperatureK: 20 })).result)).toBe('Ambient temperature must be between -50 and 100 °C.');
  });
});

describe('undo step names', () => {
  it('read as a sentence, keeping symbols and acronyms', () => {
    const valve = componentTypeById('valve-5-2')!;
    const supply = componentTypeById('air-supply')!;
    expect(parameterEditLabel('1V1', valve.parameters.switchTime!)).toBe('Set 1V1 switching time');
    expect(parameterEditLabel('1V1', valve.parameters.conductance!)).toBe('Set 1V1 sonic conductance C');
    expect(parameterEditLabel('0Z1', supply.parameters.receiverVolume!)).toBe('Set 0Z1 receiver volume');
    expect(parameterEditLabel('G1', { label: 'DC voltage' })).toBe('Set G1 DC voltage');
  });
});
