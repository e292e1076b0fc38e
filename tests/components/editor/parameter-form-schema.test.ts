import { produce } from 'immer';
import { describe, expect, it } from 'vitest';
import { addComponent } from '@/components/editor/document-commands';
import {
  componentFormSchema,
  componentFormValues,
  parameterFieldSchema,
  parameterFieldValue,
  parseDisplayNumber,
  settingsFormSchema,
  settingsFormValues,
  tagChoices,
  tubeFormSchema,
  tubeFormValues,
} from '@/components/editor/parameter-form-schema';
import { COMPONENT_TYPES, componentTypeById } from '@/engine/components/registry';
import type { ParameterSpec } from '@/engine/components/types';
import { emptyDocument } from '@/engine/document/schema';

const valveType = componentTypeById('valve-5-2')!;
const spec = (typeId: string, name: string): ParameterSpec => componentTypeById(typeId)!.parameters[name]!;

/** The SI value a field's text gives, or the message it shows. */
function enter(field: ParameterSpec, text: string | boolean) {
  const parsed = parameterFieldSchema(field).safeParse(text);
  return parsed.success ? parsed.data : parsed.error.issues.map((i) => i.message).join(' ');
}

function withParts(...types: string[]) {
  return produce(emptyDocument(), (d) => {
    types.forEach((t, i) => addComponent(d, t, { x: 100 * i, y: 0 }));
  });
}

describe('typed numbers', () => {
  it('read a decimal point or comma and an exponent, nothing else', () => {
    expect(parseDisplayNumber(' 2.5 ')).toBe(2.5);
    expect(parseDisplayNumber('0,5')).toBe(0.5);
    expect(parseDisplayNumber('.5')).toBe(0.5);
    expect(parseDisplayNumber('-3')).toBe(-3);
    expect(parseDisplayNumber('1e-3')).toBe(0.001);
    for (const bad of ['', '  ', 'abc', '0x10', '1.2.3', '1,000.5', 'Infinity', '5 bar']) expect(parseDisplayNumber(bad), bad).toBeNull();
  });
});

describe('number parameter fields', () => {
  const pilot = spec('valve-5-2', 'pilotThreshold');

  it('take display units and give SI: bar gauge to Pa gauge', () => {
    expect(enter(pilot, '2')).toBe(200_000);
    expect(enter(pilot, '0,5')).toBe(50_000);
    expect(enter(spec('valve-5-2', 'conductance'), '0.02')).toBe(2e-10);
    expect(enter(spec('cylinder-double-acting', 'bore'), '50')).toBe(0.05);
    expect(enter(spec('air-supply', 'deliveryLimit'), '600')).toBe(0.01);
  });

  it('name the allowed range in display units when a value is outside it or not a number', () => {
    const message = 'Enter a number between 0.1 and 10 bar (gauge).';
    expect(enter(pilot, '0.05')).toBe(message);
    expect(enter(pilot, '10.5')).toBe(message);
    expect(enter(pilot, '')).toBe(message);
    expect(enter(pilot, 'six')).toBe(message);
    expect(enter(spec('valve-5-2', 'switchTime'), '3')).toBe('Enter a number between 0 and 2 s.');
    expect(enter(spec('cylinder-double-acting', 'load'), '-200000')).toBe('Enter a number between -100000 and 100000 N.');
  });

  it('accept the bounds as the message writes them, and store inside the SI range', () => {
    expect(enter(pilot, '10')).toBe(1_000_000);
    expect(enter(pilot, '0.1')).toBe(10_000);
    const swivel = spec('semi-rotary-actuator', 'swivelAngle');
    expect(enter(swivel, '360')).toBe(2 * Math.PI);
    expect(enter(swivel, '2.86479')).toBeGreaterThanOrEqual(0.05);
    expect(enter(swivel, '2.8')).toBe('Enter a number between 2.86479 and 360 °.');
  });

  it('take whole numbers only for counts', () => {
    const preset = spec('counter', 'preset');
    expect(enter(preset, '12')).toBe(12);
    expect(enter(preset, '2.5')).toBe('Enter a whole number between 1 and 1000000.');
  });

  it('give back every registry default unchanged from its own displayed text', () => {
    for (const type of COMPONENT_TYPES) {
      for (const [name, field] of Object.entries(type.parameters)) {
        expect(enter(field, parameterFieldValue(field, field.default)), `${type.id}.${name}`).toBe(field.default);
      }
    }
  });
});

describe('other parameter fields', () => {
  it('take choices from the list only, flags as ticks and tag references trimmed', () => {
    expect(enter(spec('valve-5-2', 'actuation'), 'solenoid')).toBe('solenoid');
    expect(enter(spec('valve-5-2', 'actuation'), 'telepathy')).toBe('Pick one of the listed options.');
    expect(enter(spec('valve-5-2', 'manualOverride'), false)).toBe(false);
    expect(enter(spec('relay-contact-no', 'coil'), ' K2 ')).toBe('K2');
    expect(enter(spec('relay-contact-no', 'coil'), ' ')).toBe('Enter the tag of a relay, timer relay or counter.');
    expect(enter(spec('solenoid-coil', 'valve'), '')).toBe('Enter the tag of a valve.');
  });
});

describe('the component form', () => {
  const doc = withParts('valve-5-2', 'relay-coil');
  const valve = doc.components[0]!;

  it('shows a new component with its type defaults in display units', () => {
    expect(componentFormValues(valve, valveType)).toEqual({
      tag: '1V1',
      label: '',
      notes: '',
      parameters: {
        actuation: 'pushbutton',
        returnBy: 'spring',
        conductance: '1',
        criticalRatio: '0.3',
        switchTime: '0.015',
        pilotThreshold: '2',
        pilotHysteresis: '0.5',
        manualOverride: true,
        stuck: false,
      },
    });
  });

  it('shows stored values over the defaults and ignores values the type does not have', () => {
    const changed = { ...valve, label: 'Clamp valve', parameters: { switchTime: 0.03, actuation: 'solenoid', stale: 4 } };
    const values = componentFormValues(changed, valveType);
    expect(values.label).toBe('Clamp valve');
    expect(values.parameters).toMatchObject({ switchTime: '0.03', actuation: 'solenoid' });
    expect(values.parameters).not.toHaveProperty('stale');
  });

  it('checks the whole form and gives SI values', () => {
    const schema = componentFormSchema(doc, valve.id, valveType);
    const values = componentFormValues(valve, valveType);
    const parsed = schema.parse({ ...values, tag: ' 1V2 ', parameters: { ...values.parameters, pilotThreshold: '3', switchTime: '0.02' } });
    expect(parsed.tag).toBe('1V2');
    expect(parsed.parameters).toMatchObject({ pilotThreshold: 300_000, switchTime: 0.02, manualOverride: true });
  });

  it('refuses a tag another component has, naming the field in error', () => {
    const schema = componentFormSchema(doc, valve.id, valveType);
    const result = schema.safeParse({ ...componentFormValues(valve, valveType), tag: 'k1' });
    expect(result.success).toBe(false);
    expect(result.error!.issues.map((i) => [i.path.join('.'), i.message])).toEqual([['tag', 'K1 already names another component (Relay coil).']]);
  });

  it('puts each parameter error on its own field', () => {
    const schema = componentFormSchema(doc, valve.id, valveType);
    const values = componentFormValues(valve, valveType);
    const result = schema.safeParse({ ...values, parameters: { ...values.parameters, pilotThreshold: '20', criticalRatio: '1.5' } });
    expect(result.error!.issues.map((i) => i.path.join('.')).sort()).toEqual(['parameters.criticalRatio', 'parameters.pilotThreshold']);
  });

  it('still edits tag, label and notes of a component of an unknown type', () => {
    const stranger = { ...valve, type: 'no-such-type' };
    expect(componentFormValues(stranger, undefined)).toEqual({ tag: '1V1', label: '', notes: '', parameters: {} });
    expect(componentFormSchema(doc, stranger.id, undefined).parse({ tag: 'X1', label: 'old part', notes: ' kept from the old line ', parameters: {} })).toEqual({ tag: 'X1', label: 'old part', notes: 'kept from the old line', parameters: {} });
  });
});

describe('tube and settings forms', () => {
  it('show a tube in m and mm and take them back in SI', () => {
    const values = tubeFormValues({ id: 't1', from: { component: 'a', port: '1' }, to: { component: 'b', port: '1' }, lengthM: 0.5, innerDiameterM: 0.004, bends: [] });
    expect(values).toEqual({ length: '0.5', innerDiameter: '4' });
    expect(tubeFormSchema.parse({ length: '1.2', innerDiameter: '6' })).toEqual({ length: 1.2, innerDiameter: 0.006 });
    const result = tubeFormSchema.safeParse({ length: '0', innerDiameter: '300' });
    expect(result.error!.issues.map((i) => i.message)).toEqual(['Enter a number between 0.001 and 1000 m.', 'Enter a number between 0.5 and 200 mm.']);
  });

  it('show ambient pressure in bar absolute and temperature in °C', () => {
    expect(settingsFormValues(emptyDocument().settings)).toEqual({ ambientPressure: '1.01325', ambientTemperature: '20' });
    expect(settingsFormSchema.parse({ ambientPressure: '0.95', ambientTemperature: '-10' })).toEqual({ ambientPressure: 95_000, ambientTemperature: 263.15 });
    expect(settingsFormSchema.safeParse({ ambientPressure: '6', ambientTemperature: '20' }).error!.issues[0]!.message).toBe(
      'Enter a number between 0.3 and 1.2 bar (absolute).',
    );
  });
});

describe('tag choices', () => {
  const doc = withParts('relay-coil', 'timer-relay-on-delay', 'counter', 'relay-coil', 'valve-5-2', 'valve-3-2-nc', 'cylinder-double-acting', 'solenoid-coil', 'relay-contact-no');

  it('offer relays, timer relays and counters to a contact', () => {
    expect(tagChoices(doc, 'coil')).toEqual(['K1', 'K2', 'KC1', 'KT1']);
  });

  it('offer directional control valves to a solenoid coil', () => {
    expect(tagChoices(doc, 'valve')).toEqual(['1S1', '1V1']);
  });

  it('offer nothing when the circuit has no such part', () => {
    expect(tagChoices(withParts('cylinder-double-acting'), 'valve')).toEqual([]);
  });
});
