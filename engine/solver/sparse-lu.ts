/**
 * Sparse LU factorisation without pivoting for the solver's iteration matrix
 * W = I − γhJ. W is column diagonally dominant for a mass-conserving network
 * (each column of J sums to zero, diagonal negative), so elimination in any
 * order is stable; we pick a minimum-degree order once per topology, work out
 * the fill pattern symbolically, and refactor numerically each step from a flat
 * value array through precomputed slot lists.
 */
export class SparseLu {
  readonly size: number;
  /** Values of every stored entry of the permuted matrix (diagonal, upper, lower). */
  readonly values: Float64Array;
  /** Elimination order: order position → original index. */
  readonly perm: Int32Array;
  private readonly inv: Int32Array; // original index → order position
  private readonly slotOf = new Map<number, number>();
  private readonly diagSlot: Int32Array;
  // The same lists flattened (pivot k owns entries ptr[k] … ptr[k + 1] − 1), for factor and solve.
  private readonly ptr: Int32Array;
  private readonly flatIndex: Int32Array;
  private readonly flatLow: Int32Array;
  private readonly flatUp: Int32Array;
  // For each pivot k: lower slots (i,k) and upper slots (k,j), both in order positions.
  private readonly lowRows: Int32Array[] = [];
  private readonly lowSlots: Int32Array[] = [];
  private readonly upCols: Int32Array[] = [];
  private readonly upSlots: Int32Array[] = [];
  // Update triples: target slot, lower slot, upper slot.
  private readonly updates: Int32Array;
  /** 1 / pivot of each order position, kept by factor() so that the solves multiply instead of dividing. */
  private readonly inversePivot: Float64Array;

  /** `pattern` lists the off-diagonal (row, column) pairs that can be non-zero, in original indices. */
  constructor(size: number, pattern: ReadonlyArray<readonly [number, number]>) {
    this.size = size;
    const adjacency: Set<number>[] = Array.from({ length: size }, () => new Set<number>());
    for (const [i, j] of pattern) {
      if (i === j) continue;
      adjacency[i]!.add(j);
      adjacency[j]!.add(i);
    }
    this.perm = minimumDegreeOrder(adjacency.map((s) => new Set(s)));
    this.inv = new Int32Array(size);
    this.perm.forEach((orig, pos) => (this.inv[orig] = pos));

    // Symbolic elimination in order positions.
    const higher: Set<number>[] = Array.from({ length: size }, () => new Set<number>());
    for (let i = 0; i < size; i += 1) {
      for (const j of adjacency[i]!) {
        const a = this.inv[i]!;
        const b = this.inv[j]!;
        if (a < b) higher[a]!.add(b);
        else higher[b]!.add(a);
      }
    }
    for (let k = 0; k < size; k += 1) {
      const nbrs = [...higher[k]!].sort((x, y) => x - y);
      for (let x = 0; x < nbrs.length; x += 1) {
        for (let y = x + 1; y < nbrs.length; y += 1) higher[nbrs[x]!]!.add(nbrs[y]!);
      }
    }
    let slots = 0;
    this.diagSlot = new Int32Array(size);
    for (let k = 0; k < size; k += 1) this.diagSlot[k] = slots++;
    for (let k = 0; k < size; k += 1) {
      const cols = Int32Array.from([...higher[k]!].sort((x, y) => x - y));
      const up = new Int32Array(cols.length);
      const low = new Int32Array(cols.length);
      cols.forEach((j, n) => {
        up[n] = slots;
        this.slotOf.set(k * size + j, slots++);
        low[n] = slots;
        this.slotOf.set(j * size + k, slots++);
      });
      this.upCols.push(cols);
      this.lowRows.push(cols);
      this.upSlots.push(up);
      this.lowSlots.push(low);
    }
    for (let k = 0; k < size; k += 1) this.slotOf.set(k * size + k, this.diagSlot[k]!);
    const triples: number[] = [];
    for (let k = 0; k < size; k += 1) {
      const rows = this.lowRows[k]!;
      for (let a = 0; a < rows.length; a += 1) {
        for (let c = 0; c < rows.length; c += 1) {
          const target = this.slotOf.get(rows[a]! * size + rows[c]!);
          if (target === undefined) throw new Error('sparse LU: missing fill slot');
          triples.push(target, this.lowSlots[k]![a]!, this.upSlots[k]![c]!);
        }
      }
    }
    this.updates = Int32Array.from(triples);
    this.ptr = new Int32Array(size + 1);
    for (let k = 0; k < size; k += 1) this.ptr[k + 1] = this.ptr[k]! + this.lowRows[k]!.length;
    this.flatIndex = new Int32Array(this.ptr[size]!);
    this.flatLow = new Int32Array(this.ptr[size]!);
    this.flatUp = new Int32Array(this.ptr[size]!);
    for (let k = 0; k < size; k += 1) {
      this.flatIndex.set(this.lowRows[k]!, this.ptr[k]!);
      this.flatLow.set(this.lowSlots[k]!, this.ptr[k]!);
      this.flatUp.set(this.upSlots[k]!, this.ptr[k]!);
    }
    this.values = new Float64Array(slots);
    this.inversePivot = new Float64Array(size);
  }

  /** Slot of entry (row, col) in original indices; -1 when it is structurally zero. */
  slot(row: number, col: number): number {
    return this.slotOf.get(this.inv[row]! * this.size + this.inv[col]!) ?? -1;
  }

  /** Factorises the current values in place. */
  factor(): void {
    const v = this.values;
    const updates = this.updates;
    const ptr = this.ptr;
    const flatLow = this.flatLow;
    const diag = this.diagSlot;
    const inversePivot = this.inversePivot;
    let u = 0;
    for (let k = 0; k < this.size; k += 1) {
      const inverse = 1 / v[diag[k]!]!;
      inversePivot[k] = inverse;
      const from = ptr[k]!;
      const to = ptr[k + 1]!;
      for (let a = from; a < to; a += 1) v[flatLow[a]!] = v[flatLow[a]!]! * inverse;
      const end = u + 3 * (to - from) * (to - from);
      for (; u < end; u += 3) v[updates[u]!] = v[updates[u]!]! - v[updates[u + 1]!]! * v[updates[u + 2]!]!;
    }
  }

  /**
   * Solves (LU) x = b in place on b given in elimination order (entry k belongs to original
   * index perm[k]): for callers that keep their vectors in that order and save the reordering.
   */
  solveOrdered(w: Float64Array): void {
    const v = this.values;
    const ptr = this.ptr;
    const index = this.flatIndex;
    const low = this.flatLow;
    const up = this.flatUp;
    const inversePivot = this.inversePivot;
    const size = this.size;
    for (let k = 0; k < size; k += 1) {
      const wk = w[k]!;
      if (wk === 0) continue;
      for (let a = ptr[k]!, to = ptr[k + 1]!; a < to; a += 1) w[index[a]!] = w[index[a]!]! - v[low[a]!]! * wk;
    }
    for (let k = size - 1; k >= 0; k -= 1) {
      let sum = w[k]!;
      for (let c = ptr[k]!, to = ptr[k + 1]!; c < to; c += 1) sum -= v[up[c]!]! * w[index[c]!]!;
      w[k] = sum * inversePivot[k]!;
    }
  }
}

/** Greedy minimum-degree ordering on an undirected graph (ties broken by index, for determinism). */
function minimumDegreeOrder(adjacency: Set<number>[]): Int32Array {
  const n = adjacency.length;
  const order = new Int32Array(n);
  const done = new Uint8Array(n);
  for (let pos = 0; pos < n; pos += 1) {
    let best = -1;
    let bestDegree = Infinity;
    for (let i = 0; i < n; i += 1) {
      if (!done[i] && adjacency[i]!.size < bestDegree) {
        best = i;
        bestDegree = adjacency[i]!.size;
      }
    }
    order[pos] = best;
    done[best] = 1;
    const nbrs = [...adjacency[best]!];
    for (const a of nbrs) {
      adjacency[a]!.delete(best);
      for (const b of nbrs) if (a !== b) adjacency[a]!.add(b);
    }
    adjacency[best]!.clear();
  }
  return order;
}
