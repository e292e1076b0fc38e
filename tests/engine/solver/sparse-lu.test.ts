import { describe, expect, it } from 'vitest';
import { SparseLu } from '@/engine/solver/sparse-lu';

function denseSolve(a: number[][], b: number[]): number[] {
  const n = b.length;
  const m = a.map((row, i) => [...row, b[i]!]);
  for (let k = 0; k < n; k += 1) {
    for (let i = k + 1; i < n; i += 1) {
      const f = m[i]![k]! / m[k]![k]!;
      for (let j = k; j <= n; j += 1) m[i]![j]! -= f * m[k]![j]!;
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let i = n - 1; i >= 0; i -= 1) {
    let s = m[i]![n]!;
    for (let j = i + 1; j < n; j += 1) s -= m[i]![j]! * x[j]!;
    x[i] = s / m[i]![i]!;
  }
  return x;
}

describe('SparseLu', () => {
const HUB_AND_CHAIN: Array<[number, number]> = [[0, 1], [0, 2], [0, 3], [0, 4], [0, 5], [5, 6], [6, 7], [2, 3]];

/** A column diagonally dominant matrix on the hub-and-chain pattern; `scale` varies the off-diagonal values. */
function hubAndChain(scale: number): number[][] {
  const n = 8;
  const dense = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  HUB_AND_CHAIN.forEach(([i, j], e) => {
    dense[i]![j] = (-0.3 - 0.01 * e) * scale;
    dense[j]![i] = (-0.2 - 0.02 * e) * scale;
  });
  for (let i = 0; i < n; i += 1) dense[i]![i] = 1 + dense.reduce((s, row) => s + Math.abs(row[i]!), 0);
  return dense;
}

function load(lu: SparseLu, dense: number[][]): void {
  for (let i = 0; i < dense.length; i += 1) {
    for (let j = 0; j < dense.length; j += 1) {
      if (dense[i]![j] === 0) continue;
      const slot = lu.slot(i, j);
      expect(slot).toBeGreaterThanOrEqual(0);
      lu.values[slot] = dense[i]![j]!;
    }
  }
}

/** Solves with the factorised lu and compares with a dense elimination of the same matrix. */
function expectSolves(lu: SparseLu, dense: number[][]): void {
  const n = dense.length;
  const b = Float64Array.from({ length: n }, (_, i) => Math.sin(i + 1));
  const expected = denseSolve(dense, [...b]);
  const x = Float64Array.from(b);
  lu.solve(x);
  expected.forEach((value, i) => expect(x[i]).toBeCloseTo(value, 12));
}

describe('SparseLu', () => {
  it('solves a hub-and-chain system with fill-in as a dense elimination does', () => {
    const dense = hubAndChain(1);
    const lu = new SparseLu(dense.length, HUB_AND_CHAIN);
    load(lu, dense);
    lu.factor();
    expectSolves(lu, dense);
    // A reordering that is not the identity, so the test sees it.
    expect([...lu.perm]).not.toEqual([...lu.perm].sort((x, y) => x - y));
  });

  it('keeps the values of two factorisations of the same pattern apart (they share only the symbolic analysis)', () => {
    const first = hubAndChain(1);
    const second = hubAndChain(2.5);
    const a = new SparseLu(first.length, HUB_AND_CHAIN);
    const b = new SparseLu(second.length, HUB_AND_CHAIN);
    expect(b.perm).toBe(a.perm);
    load(a, first);
    load(b, second);
    a.factor();
    b.factor();
    expectSolves(a, first);
    expectSolves(b, second);
  });

  it('gives the same factors and solutions bit for bit written out straight and as loops', () => {
    const dense = hubAndChain(1.7);
    const straight = new SparseLu(dense.length, HUB_AND_CHAIN);
    const loops = new SparseLu(dense.length, HUB_AND_CHAIN, { loops: true });
    expect([straight.form, loops.form]).toEqual(['straight-line', 'loops']);
    load(straight, dense);
    load(loops, dense);
    straight.factor();
    loops.factor();
    expect([...straight.values]).toEqual([...loops.values]);
    const b = Float64Array.from({ length: dense.length }, (_, i) => Math.cos(3 * i + 0.5));
    const x = Float64Array.from(b);
    const y = Float64Array.from(b);
    straight.solve(x);
    loops.solve(y);
    expect([...x]).toEqual([...y]);
    expectSolves(loops, dense);
  });
});
});
