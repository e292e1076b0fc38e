import { describe, expect, it } from 'vitest';
import { compile } from '@/engine/solver/compile';
import { simulate, type InputEvent } from '@/engine/solver/simulate';
import type { CircuitDocument } from '@/engine/document/schema';
import { demoDocument, demoInputs } from '../../support/demo-circuits';
import { bar, cylinderRig, meterOut, pressFor } from '../components/harness';

function run(document: CircuitDocument, inputs: readonly InputEvent[], untilS: number, straightLine: boolean) {
  const { model, diagnostics } = compile(document);
  if (!model) throw new Error(diagnostics.map((d) => d.message).join('\n'));
  return simulate(model, inputs, { untilS, intervalS: 0.01, straightLine });
}

/** The same run with each partition's right-hand side and LU written out as straight-line code, and as loops. */
function expectSameBitForBit(document: CircuitDocument, inputs: readonly InputEvent[], untilS: number): void {
  const straight = run(document, inputs, untilS, true);
  const loops = run(document, inputs, untilS, false);
  expect(straight.stats).toEqual(loops.stats);
  expect(straight.events).toEqual(loops.events);
  expect(straight.signals.map((s) => s.name)).toEqual(loops.signals.map((s) => s.name));
  straight.signals.forEach((s, i) => {
    // Object.is tells every bit apart, -0 from 0 included.
    const differs = s.values.findIndex((v, k) => !Object.is(v, loops.signals[i]!.values[k]));
    expect({ signal: s.name, firstDifference: differs }).toEqual({ signal: s.name, firstDifference: -1 });
  });
}

describe('straight-line and loop forms of the solver', () => {
  for (const name of ['lid-press-two-hand', 'lid-press-two-hand-timed', 'lid-press-relay-control', 'carton-clamp-sequence', 'reject-gate-quick-exhaust']) {
    it(`give the same trace bit for bit: demo ${name}`, () => {
      expectSameBitForBit(demoDocument(name), demoInputs(name), 4);
    });
  }

  it('give the same trace bit for bit with a pressure regulator (a modulated passage) and polytropic, meter-out cylinder chambers', () => {
    const document = cylinderRig({ valve: { actuation: 'pushbutton' }, cylinder: { polytropicExponent: 1.3 }, lineA: meterOut('fa', 0.3), lineB: meterOut('fb', 0.5) })
      .add('reg', 'pressure-regulator', { setPressure: bar(4), band: bar(0.3), relieving: true })
      .add('res', 'reservoir', { volume: 1e-4 })
      .tube('sup:2', 'reg:1')
      .tube('reg:2', 'res:1')
      .build();
    expectSameBitForBit(document, [...pressFor('v', 0.1, 0.8), { t: 1.2, component: 'reg', action: 'set', value: bar(2) }], 2);
  });
});
