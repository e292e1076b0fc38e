import { describe, expect, it } from 'vitest';
import { flowColumns } from '@/components/editor/run/flow-columns';
import { compile } from '@/engine/solver/compile';
import { simulate } from '@/engine/solver/simulate';
import { signal } from '@/engine/trace/trace';
import { TestCircuit } from '../../engine/support/circuit';

// A hand-worked 5/2 valve driving a double-acting cylinder; the first tube runs from the valve's port 4 to the cylinder's A.
const document = new TestCircuit()
  .add('src', 'air-supply', { pressure: 600_000 })
  .add('v', 'valve-5-2', {})
  .add('c', 'cylinder-double-acting', { bore: 0.032, rod: 0.012, stroke: 0.1 })
  .tube('v:4', 'c:A')
  .tube('v:2', 'c:B')
  .tube('src:2', 'v:1')
  .build();
const supplyTube = document.tubes[2]!.id;
const tubeToA = document.tubes[0]!.id;

describe('the flow shown on a tube or a port', () => {
  const { model } = compile(document);
  const trace = simulate(model!, [{ t: 0.1, component: 'v', action: 'press' }, { t: 1, component: 'v', action: 'release' }], { untilS: 2, intervalS: 0.005 });
  const names = trace.signals.map((s) => s.name);
  const { tubes: columns, ports } = flowColumns(document, model!, names);

  it("sums the passages of the part at the tube's first end that open onto that port", () => {
    const picked = columns[tubeToA]!.map(([c, sign]) => [names[c], sign]);
    // Port 4 of a 5/2 valve is fed from 1 in one position and exhausts to 5 in the other: two passages, both its own.
    expect(picked).toHaveLength(2);
    for (const [name] of picked) expect(name).toMatch(/^v:q:/);
    expect(picked.map(([, sign]) => sign).sort()).toEqual([-1, 1]);
  });

  it('is positive while air goes out into the tube (extending) and negative while it comes back (retracting)', () => {
    const flowAt = (t: number) => {
      const k = Math.round(t / trace.intervalS);
      return columns[tubeToA]!.reduce((sum, [c, sign]) => sum + sign * trace.signals[c]!.values[k]!, 0);
    };
    const x = signal(trace, 'c:x')!.values;
    const moving = (t: number) => {
      const k = Math.round(t / trace.intervalS);
      return x[k + 1]! - x[k - 1]!;
    };
    // Pick moments when the piston is on its way out and on its way back.
    const out = trace.time.find((t) => t > 0.1 && moving(t) > 1e-5)!;
    const back = trace.time.find((t) => t > 1 && moving(t) < -1e-5)!;
    expect(flowAt(out)).toBeGreaterThan(0);
    expect(flowAt(back)).toBeLessThan(0);
  });

  it("takes the part at the second end, counted the other way, when the first end's part has no passage onto it", () => {
    // An ideal supply holds its port without a passage: the valve's passages at its port 1 stand in.
    const picked = columns[supplyTube]!.map(([c, sign]) => [names[c], sign]);
    expect(picked.length).toBeGreaterThan(0);
    for (const [name] of picked) expect(name).toMatch(/^v:q:/);
    // Air goes from the supply into the valve while the piston is on its way out: positive, from the first end to the second.
    const x = signal(trace, 'c:x')!.values;
    const out = x.findIndex((v, k) => k > 0 && v > 0.02 && v < 0.08);
    expect(columns[supplyTube]!.reduce((sum, [c, sign]) => sum + sign * trace.signals[c]!.values[out]!, 0)).toBeGreaterThan(0);
  });

  it("gives each port the flow out of its own part: the valve's port 4 and the cylinder's port A see the same air, one leaving, one arriving", () => {
    const sum = (key: string, k: number) => ports[key]!.reduce((total, [c, sign]) => total + sign * trace.signals[c]!.values[k]!, 0);
    const x = signal(trace, 'c:x')!.values;
    const k = x.findIndex((v, i) => i > 0 && v > 0.02 && v < 0.08);
    expect(sum('v:4', k)).toBeGreaterThan(0);
    expect(sum('c:A', k)).toBeLessThan(0);
    // The tube holds little air, so what the valve sends is nearly what the cylinder takes (within 10 %).
    expect(Math.abs(sum('v:4', k) + sum('c:A', k))).toBeLessThan(0.1 * sum('v:4', k));
    // The ideal supply holds its port without a passage: no flow of its own to show.
    expect(ports['src:2']).toBeUndefined();
  });
});
