import { describe, expect, it } from 'vitest';
import { compile } from '@/engine/solver/compile';
import { simulate, type InputEvent } from '@/engine/solver/simulate';
import { signal } from '@/engine/trace/trace';
import { TestCircuit } from '../support/circuit';

/** Two cells on one supply: a 5/2 valve pressed by hand driving a double-acting cylinder, twice over. */
function twoCells() {
  const circuit = new TestCircuit().add('src', 'air-supply', { pressure: 600_000 });
  for (const n of [1, 2]) {
    circuit
      .add(`v${n}`, 'valve-5-2', {})
      .add(`c${n}`, 'cylinder-double-acting', { bore: 0.032, rod: 0.012, stroke: 0.1 })
      .tube('src:2', `v${n}:1`)
      .tube(`v${n}:4`, `c${n}:A`)
      .tube(`v${n}:2`, `c${n}:B`);
  }
  return circuit.build();
}

function run(inputs: InputEvent[]) {
  const { model } = compile(twoCells());
  return simulate(model!, inputs, { untilS: 2, intervalS: 0.005 });
}

describe('happenings are handled where they act', () => {
  const cell2: InputEvent[] = [
    { t: 0.1, component: 'v2', action: 'press' },
    { t: 1.0, component: 'v2', action: 'release' },
  ];
  // Cell 1 switches while cell 2's cylinder is on its way out and back.
  const cell1: InputEvent[] = [0.15, 0.2, 0.25, 0.3, 1.05, 1.1].map((t, i) => ({ t, component: 'v1', action: i % 2 ? 'release' : 'press' }));

  it("leaves a partition that nothing touches alone: cell 2's trace is the same bit for bit whatever cell 1 does", () => {
    const alone = run(cell2);
    const busy = run([...cell1, ...cell2]);
    for (const name of ['c2:x', 'c2:v', 'c2:p:A', 'c2:p:B']) expect(signal(busy, name)!.values).toEqual(signal(alone, name)!.values);
    const ends = (trace: typeof alone) => trace.events.filter((e) => e.componentId === 'c2').map((e) => `${e.t} ${e.kind} ${e.detail ?? ''}`);
    expect(ends(busy)).toEqual(ends(alone));
    // Cell 1 really moved in between (so the test exercises what it claims).
    expect(busy.events.filter((e) => e.componentId === 'v1' && e.kind === 'switched').length).toBeGreaterThanOrEqual(4);
    expect(Math.max(...signal(busy, 'c1:x')!.values)).toBeGreaterThan(0.005);
  });

  it('reports happenings in time order', () => {
    const trace = run([...cell1, ...cell2]);
    const times = trace.events.map((e) => e.t);
    expect(times).toEqual([...times].sort((a, b) => a - b));
  });
});
