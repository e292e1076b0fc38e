import { describe, expect, it } from 'vitest';
import { componentTypeById } from '@/engine/components/registry';
import { compile } from '@/engine/solver/compile';
import { TestCircuit } from '../support/circuit';

const codes = (circuit: TestCircuit) => compile(circuit.build()).diagnostics.map((d) => `${d.code}:${d.severity}`);

describe('control circuit diagnostics at compile time', () => {
  it('a clean relay circuit compiles without electrical diagnostics', () => {
    const circuit = new TestCircuit()
      .add('ps', 'dc-supply')
      .add('S1', 'pushbutton-no')
      .add('K1', 'relay-coil')
      .add('K1a', 'relay-contact-no', { coil: 'K1' })
      .add('M1', 'solenoid-coil', { valve: 'V1', side: '14' })
      .add('V1', 'valve-3-2-nc', { actuation: 'solenoid' })
      .wire('ps:L+', 'S1:13')
      .wire('S1:14', 'K1:A1')
      .wire('K1:A2', 'ps:M')
      .wire('ps:L+', 'K1a:13')
      .wire('K1a:14', 'M1:A1')
      .wire('M1:A2', 'ps:M');
    expect(codes(circuit).filter((c) => !c.startsWith('unconnected-port'))).toEqual([]);
  });

  it('names a coil with no valve, a contact with no coil and a solenoid with no coil', () => {
    const circuit = new TestCircuit()
      .add('ps', 'dc-supply')
      .add('M1', 'solenoid-coil', { valve: 'V9' })
      .add('M2', 'solenoid-coil', { valve: 'V2', side: '12' })
      .add('V2', 'valve-5-2', { actuation: 'solenoid', returnBy: 'spring' })
      .add('K9a', 'relay-contact-no', { coil: 'K9' });
    const diagnostics = compile(circuit.build()).diagnostics;
    const find = (code: string) => diagnostics.filter((d) => d.code === code);
    expect(find('coil-without-valve').map((d) => d.componentId)).toEqual(['M1', 'M2']);
    expect(find('coil-without-valve')[1]!.message).toContain('no solenoid on side 12');
    expect(find('contact-without-coil').map((d) => d.componentId)).toEqual(['K9a']);
    expect(find('solenoid-without-coil').map((d) => d.message)).toEqual(['V2: the solenoid on side 14 has no coil in the control circuit']);
    expect(compile(circuit.build()).model).not.toBeNull();
  });

  it('refuses a short circuit from + to 0 V, two coils with one tag, and wires or tubes on the wrong kind of port', () => {
    const short = new TestCircuit().add('ps', 'dc-supply').wire('ps:L+', 'ps:M');
    expect(codes(short)).toContain('short-circuit:error');
    expect(compile(short.build()).model).toBeNull();

    const twoCoils = new TestCircuit().add('ps', 'dc-supply').add('a', 'relay-coil', {}, 'K1').add('b', 'timer-relay-on-delay', {}, 'K1');
    expect(codes(twoCoils)).toContain('duplicate-coil-tag:error');

    const mixed = new TestCircuit().add('ps', 'dc-supply').add('v', 'valve-3-2-nc').add('src', 'air-supply').wire('ps:L+', 'v:1').tube('src:2', 'ps:M');
    expect(codes(mixed)).toEqual(expect.arrayContaining(['wire-on-air-port:error', 'tube-on-terminal:error']));
  });

  it('defaults the control supply to 24 V DC (common practice for machine control circuits; IEC 60204-1 context)', () => {
    const spec = componentTypeById('dc-supply')!.parameters.voltage!;
    expect(spec.kind === 'number' && spec.default).toBe(24);
  });
});
