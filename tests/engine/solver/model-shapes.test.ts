import { describe, expect, it } from 'vitest';
import { compile } from '@/engine/solver/compile';
import type { SolverModel } from '@/engine/solver/model';
import type { CircuitDocument } from '@/engine/document/schema';
import { demoDocument } from '../../support/demo-circuits';
import { bar, cylinderRig, meterOut } from '../components/harness';

function modelOf(document: CircuitDocument): SolverModel {
  const { model, diagnostics } = compile(document);
  if (!model) throw new Error(diagnostics.map((d) => d.message).join('\n'));
  return model;
}

/** The distinct lists of field names among the records, in their order. */
function shapes(records: readonly object[]): string[] {
  return [...new Set(records.map((r) => Object.keys(r).join(',')))];
}

// The solver reads passages, pistons and nodes in its inner loops; records that all have the same
// fields in the same order share one hidden class in a JavaScript engine, and its reads of them
// stay on the fast path; records spread from the component types' own specs did not.
describe('the compiled model', () => {
  const models = [
    ...['lid-press-two-hand', 'lid-press-two-hand-timed', 'lid-press-relay-control', 'carton-clamp-sequence', 'reject-gate-quick-exhaust'].map((name) => modelOf(demoDocument(name))),
    modelOf(
      cylinderRig({ valve: { actuation: 'pushbutton' }, cylinder: { polytropicExponent: 1.3 }, lineA: meterOut('fa', 0.3), lineB: meterOut('fb', 0.5) })
        .add('reg', 'pressure-regulator', { setPressure: bar(4), band: bar(0.3), relieving: true })
        .add('res', 'reservoir', { volume: 1e-4 })
        .add('sa', 'cylinder-single-acting', {})
        .tube('sup:2', 'reg:1')
        .tube('reg:2', 'res:1')
        .build(),
    ),
  ];
  const all = <T extends object>(pick: (m: SolverModel) => readonly T[]) => models.flatMap((m) => [...pick(m)]);

  it('gives every passage the same fields in the same order, one-way, modulated or plain', () => {
    const restrictions = all((m) => m.restrictions);
    expect(restrictions.some((r) => r.oneWay) && restrictions.some((r) => r.modulator) && restrictions.some((r) => !r.oneWay && !r.modulator)).toBe(true);
    expect(shapes(restrictions)).toHaveLength(1);
  });

  it('gives every piston the same fields in the same order, single- and double-acting', () => {
    const pistons = all((m) => m.pistons);
    expect(pistons.some((p) => p.rodNode === null) && pistons.some((p) => p.rodNode !== null)).toBe(true);
    expect(shapes(pistons)).toHaveLength(1);
  });

  it('gives every node the same fields in the same order, boundaries and polytropic chambers included', () => {
    const nodes = all((m) => m.nodes);
    expect(nodes.some((n) => n.holder !== undefined) && nodes.some((n) => n.polytropicExponent !== undefined) && nodes.some((n) => !n.fixed)).toBe(true);
    expect(shapes(nodes)).toHaveLength(1);
  });
});
