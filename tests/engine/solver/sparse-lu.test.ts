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
  it('solves a hub-and-chain system with fill-in as a dense elimination does', () => {
    const edges: Array<[number, number]> = [[0, 1], [0, 2], [0, 3], [0, 4], [0, 5], [5, 6], [6, 7], [2, 3]];
    const n = 8;
    const dense = Array.from({ length: n }, () => new Array<number>(n).fill(0));
    edges.forEach(([i, j], e) => {
      dense[i]![j] = -0.3 - 0.01 * e;
      dense[j]![i] = -0.2 - 0.02 * e;
    });
    for (let i = 0; i < n; i += 1) dense[i]![i] = 1 + dense.reduce((s, row) => s + Math.abs(row[i]!), 0);
    const lu = new SparseLu(n, edges);
    for (let i = 0; i < n; i += 1) {
      for (let j = 0; j < n; j += 1) {
        if (dense[i]![j] === 0) continue;
        const slot = lu.slot(i, j);
        expect(slot).toBeGreaterThanOrEqual(0);
        lu.values[slot] = dense[i]![j]!;
      }
    }
    lu.factor();
    const b = Float64Array.from({ length: n }, (_, i) => Math.sin(i + 1));
    const expected = denseSolve(dense, [...b]);
    // The solver keeps its vectors in the elimination order: entry k belongs to unknown perm[k].
    const ordered = Float64Array.from(lu.perm, (i) => b[i]!);
    lu.solveOrdered(ordered);
    lu.perm.forEach((i, k) => expect(ordered[k]).toBeCloseTo(expected[i]!, 12));
    // A reordering that is not the identity, so the test sees it.
    expect([...lu.perm]).not.toEqual([...lu.perm].sort((x, y) => x - y));
  });
});
