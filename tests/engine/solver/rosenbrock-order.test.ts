import { describe, expect, it } from 'vitest';
import { ROS34PW2 } from '@/engine/solver/partition';

// Test problem with a known solution: y1' = −y1 + y2², y2' = −y2, y(0) = (1, 1);
// y2 = e^−t, y1 = 2e^−t − e^−2t.
const f = (y: number[]): number[] => [-y[0]! + y[1]! * y[1]!, -y[1]!];
const exactJ = (y: number[]): number[][] => [[-1, 2 * y[1]!], [0, -1]];
const exact = (t: number): number[] => [2 * Math.exp(-t) - Math.exp(-2 * t), Math.exp(-t)];

/** One step of the tableau in its transformed form, dense 2×2, with the Jacobian approximation given. */
function step(y: number[], h: number, jac: (y: number[]) => number[][]): { y: number[]; yHat: number[] } {
  const { stages, gamma, a, c, m, e } = ROS34PW2;
  const j = jac(y);
  const w = [
    [1 - gamma * h * j[0]![0]!, -gamma * h * j[0]![1]!],
    [-gamma * h * j[1]![0]!, 1 - gamma * h * j[1]![1]!],
  ];
  const det = w[0]![0]! * w[1]![1]! - w[0]![1]! * w[1]![0]!;
  const solve = (b: number[]): number[] => [(w[1]![1]! * b[0]! - w[0]![1]! * b[1]!) / det, (w[0]![0]! * b[1]! - w[1]![0]! * b[0]!) / det];
  const u: number[][] = [];
  for (let i = 0; i < stages; i += 1) {
    const yi = y.map((v, n) => v + a[i]!.reduce((s, aij, jj) => s + aij * u[jj]![n]!, 0));
    const fi = f(yi);
    u.push(solve(fi.map((v, n) => gamma * h * v + c[i]!.reduce((s, cij, jj) => s + cij * u[jj]![n]!, 0))));
  }
  const yNew = y.map((v, n) => v + m.reduce((s, mj, jj) => s + mj * u[jj]![n]!, 0));
  const yHat = yNew.map((v, n) => v - e.reduce((s, ej, jj) => s + ej * u[jj]![n]!, 0));
  return { y: yNew, yHat };
}

/** Global error at t = 1 with n fixed steps, of the main and of the embedded solution (each run on its own). */
function globalError(n: number, jac: (y: number[]) => number[][]): { main: number; embedded: number } {
  let y = [1, 1];
  let yHat = [1, 1];
  for (let k = 0; k < n; k += 1) {
    y = step(y, 1 / n, jac).y;
    yHat = step(yHat, 1 / n, jac).yHat;
  }
  const ref = exact(1);
  return { main: Math.hypot(y[0]! - ref[0]!, y[1]! - ref[1]!), embedded: Math.hypot(yHat[0]! - ref[0]!, yHat[1]! - ref[1]!) };
}

const jacobians: Array<[string, (y: number[]) => number[][]]> = [
  ['the exact Jacobian', exactJ],
  ['no Jacobian at all (J = 0)', () => [[0, 0], [0, 0]]],
  ['a wrong Jacobian', (y) => [[-3, 0.5 * y[1]!], [1, -0.2]]],
];

describe('ROS34PW2 tableau (Rang & Angermann 2005)', () => {
  for (const [name, jac] of jacobians) {
    it(`is third order, with a second-order embedded solution, using ${name}`, () => {
      const coarse = globalError(40, jac);
      const fine = globalError(80, jac);
      const order = Math.log2(coarse.main / fine.main);
      const embeddedOrder = Math.log2(coarse.embedded / fine.embedded);
      expect(order).toBeGreaterThan(2.8);
      expect(order).toBeLessThan(3.3);
      expect(embeddedOrder).toBeGreaterThan(1.8);
      expect(embeddedOrder).toBeLessThan(2.3);
    });
  }

  it('is L-stable: a very stiff linear decay is damped to zero in one step', () => {
    const { stages, gamma, a, c, m } = ROS34PW2;
    // y' = λy with hλ = −1e8, exact Jacobian: the stability function R(z) at z = −1e8.
    const z = -1e8;
    const u: number[] = [];
    for (let i = 0; i < stages; i += 1) {
      const yi = 1 + a[i]!.reduce((s, aij, j) => s + aij * u[j]!, 0);
      u.push((gamma * z * yi + c[i]!.reduce((s, cij, j) => s + cij * u[j]!, 0)) / (1 - gamma * z));
    }
    const r = 1 + m.reduce((s, mj, j) => s + mj * u[j]!, 0);
    expect(Math.abs(r)).toBeLessThan(1e-6);
  });
});
