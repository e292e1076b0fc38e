/**
 * Sparse LU factorisation without pivoting for the solver's iteration matrix
 * W = I − γhJ. W is column diagonally dominant for a mass-conserving network
 * (each column of J sums to zero, diagonal negative), so elimination in any
 * order is stable; we pick a minimum-degree order once per topology, work out
 * the fill pattern symbolically, and refactor numerically each step from a flat
 * value array through precomputed slot lists.
 */
/**
 * The symbolic part of the factorisation: elimination order, fill pattern and the slot lists
 * that factor() and the solves walk. It depends on the pattern only, and partitions of the same
 * shape are common (a circuit's repeated cells, every run of the same circuit), so it is worked
 * out once per pattern and shared; each SparseLu keeps only its own values.
 */
interface Symbolic {
  readonly size: number;
  /** Elimination order: order position → original index. */
  readonly perm: Int32Array;
  /** Original index → order position. */
  readonly inv: Int32Array;
  readonly slotOf: ReadonlyMap<number, number>;
  readonly diagSlot: Int32Array;
  /** Pivot k owns entries ptr[k] … ptr[k + 1] − 1 of the flat lists: row/column, lower slot, upper slot. */
  readonly ptr: Int32Array;
  readonly flatIndex: Int32Array;
  readonly flatLow: Int32Array;
  readonly flatUp: Int32Array;
  /** Update triples: target slot, lower slot, upper slot. */
  readonly updates: Int32Array;
  readonly slots: number;
  /** factor() and solve() for this pattern. */
  readonly kernels: Kernels;
}

/**
 * The numeric work on one pattern: factorise the values in place (keeping 1 / pivot), and solve
 * in place on a right-hand side given and returned in the original order.
 */
interface Kernels {
  readonly form: 'straight-line' | 'loops';
  factor(values: Float64Array, inversePivot: Float64Array): void;
  solve(b: Float64Array, values: Float64Array, inversePivot: Float64Array): void;
}

/**
 * Beyond this many stored entries a pattern keeps the loops: straight-line code grows with the
 * number of updates, and a partition that large is not one of the small repeated ones it pays for.
 */
const STRAIGHT_LINE_SLOT_LIMIT = 4000;

/** Patterns analysed so far; bounded so that a long-lived worker editing many circuits does not grow without end. */
const symbolicCache = new Map<string, Symbolic>();
const SYMBOLIC_CACHE_LIMIT = 512;

function symbolicOf(size: number, pattern: ReadonlyArray<readonly [number, number]>): Symbolic {
  let key = String(size);
  for (const [i, j] of pattern) key += `,${i}:${j}`;
  let symbolic = symbolicCache.get(key);
  if (!symbolic) {
    symbolic = analyse(size, pattern);
    if (symbolicCache.size >= SYMBOLIC_CACHE_LIMIT) symbolicCache.delete(symbolicCache.keys().next().value!);
    symbolicCache.set(key, symbolic);
  }
  return symbolic;
}

function analyse(size: number, pattern: ReadonlyArray<readonly [number, number]>): Symbolic {
  const adjacency: Set<number>[] = Array.from({ length: size }, () => new Set<number>());
  for (const [i, j] of pattern) {
    if (i === j) continue;
    adjacency[i]!.add(j);
    adjacency[j]!.add(i);
  }
  const perm = minimumDegreeOrder(adjacency.map((s) => new Set(s)));
  const inv = new Int32Array(size);
  perm.forEach((orig, pos) => (inv[orig] = pos));

  // Symbolic elimination in order positions.
  const higher: Set<number>[] = Array.from({ length: size }, () => new Set<number>());
  for (let i = 0; i < size; i += 1) {
    for (const j of adjacency[i]!) {
      const a = inv[i]!;
      const b = inv[j]!;
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
  // For each pivot k: the rows/columns it meets, and its lower slots (i,k) and upper slots (k,j), in order positions.
  const slotOf = new Map<number, number>();
  const cross: Int32Array[] = [];
  const lowSlots: Int32Array[] = [];
  const upSlots: Int32Array[] = [];
  let slots = 0;
  const diagSlot = new Int32Array(size);
  for (let k = 0; k < size; k += 1) diagSlot[k] = slots++;
  for (let k = 0; k < size; k += 1) {
    const cols = Int32Array.from([...higher[k]!].sort((x, y) => x - y));
    const up = new Int32Array(cols.length);
    const low = new Int32Array(cols.length);
    cols.forEach((j, n) => {
      up[n] = slots;
      slotOf.set(k * size + j, slots++);
      low[n] = slots;
      slotOf.set(j * size + k, slots++);
    });
    cross.push(cols);
    upSlots.push(up);
    lowSlots.push(low);
  }
  for (let k = 0; k < size; k += 1) slotOf.set(k * size + k, diagSlot[k]!);
  const triples: number[] = [];
  for (let k = 0; k < size; k += 1) {
    const rows = cross[k]!;
    for (let a = 0; a < rows.length; a += 1) {
      for (let c = 0; c < rows.length; c += 1) {
        const target = slotOf.get(rows[a]! * size + rows[c]!);
        if (target === undefined) throw new Error('sparse LU: missing fill slot');
        triples.push(target, lowSlots[k]![a]!, upSlots[k]![c]!);
      }
    }
  }
  const ptr = new Int32Array(size + 1);
  for (let k = 0; k < size; k += 1) ptr[k + 1] = ptr[k]! + cross[k]!.length;
  const flatIndex = new Int32Array(ptr[size]!);
  const flatLow = new Int32Array(ptr[size]!);
  const flatUp = new Int32Array(ptr[size]!);
  for (let k = 0; k < size; k += 1) {
    flatIndex.set(cross[k]!, ptr[k]!);
    flatLow.set(lowSlots[k]!, ptr[k]!);
    flatUp.set(upSlots[k]!, ptr[k]!);
  }
  const updates = Int32Array.from(triples);
  const lists = { size, perm, ptr, flatIndex, flatLow, flatUp, updates, diagSlot };
  const kernels = (slots <= STRAIGHT_LINE_SLOT_LIMIT && straightLineKernels(lists)) || loopKernels(lists);
  return { size, perm, inv, slotOf, diagSlot, ptr, flatIndex, flatLow, flatUp, updates, slots, kernels };
}

type Lists = Pick<Symbolic, 'size' | 'perm' | 'ptr' | 'flatIndex' | 'flatLow' | 'flatUp' | 'updates' | 'diagSlot'>;

/**
 * The factorisation and the solves written out for one pattern, every slot and index a constant
 * and the right-hand side held in locals: the solver refactorises and solves small systems of the
 * same few shapes millions of times, and the loops' index loads and bookkeeping cost about twice
 * the arithmetic (one factorisation and five solves of the benchmark's ten-state pattern took 3.2
 * times as long as loops; factor and solve went from 12 % to 5 % of the benchmark). The operations and
 * their order are those of loopKernels, so both give the same results bit for bit. Null where the
 * platform forbids compiling code at run time (a strict content security policy).
 */
function straightLineKernels(l: Lists): Kernels | null {
  const n = l.size;
  const factor: string[] = [];
  let u = 0;
  for (let k = 0; k < n; k += 1) {
    factor.push(`const p${k} = 1 / v[${l.diagSlot[k]}]; ip[${k}] = p${k};`);
    for (let a = l.ptr[k]!; a < l.ptr[k + 1]!; a += 1) factor.push(`v[${l.flatLow[a]}] = v[${l.flatLow[a]}] * p${k};`);
    const end = u + 3 * (l.ptr[k + 1]! - l.ptr[k]!) ** 2;
    for (; u < end; u += 3) factor.push(`v[${l.updates[u]}] = v[${l.updates[u]}] - v[${l.updates[u + 1]}] * v[${l.updates[u + 2]}];`);
  }
  const solve: string[] = [];
  for (let k = 0; k < n; k += 1) solve.push(`let w${k} = b[${l.perm[k]}];`);
  for (let k = 0; k < n; k += 1) {
    for (let a = l.ptr[k]!; a < l.ptr[k + 1]!; a += 1) solve.push(`w${l.flatIndex[a]} = w${l.flatIndex[a]} - v[${l.flatLow[a]}] * w${k};`);
  }
  for (let k = n - 1; k >= 0; k -= 1) {
    let sum = `w${k}`;
    for (let c = l.ptr[k]!; c < l.ptr[k + 1]!; c += 1) sum += ` - v[${l.flatUp[c]}] * w${l.flatIndex[c]}`;
    solve.push(`w${k} = (${sum}) * ip[${k}]; b[${l.perm[k]}] = w${k};`);
  }
  try {
    return {
      form: 'straight-line',
      factor: new Function('v', 'ip', `${factor.join('\n')}\n//# sourceURL=written-lu-factor.js`) as Kernels['factor'],
      solve: new Function('b', 'v', 'ip', `${solve.join('\n')}\n//# sourceURL=written-lu-solve.js`) as Kernels['solve'],
    };
  } catch {
    return null;
  }
}

/** The same work as loops over the slot lists. */
function loopKernels(l: Lists): Kernels {
  const { size, perm, ptr, flatIndex: index, flatLow: low, flatUp: up, updates, diagSlot: diag } = l;
  const w = new Float64Array(size);
  return {
    form: 'loops',
    factor(v, inversePivot) {
      let u = 0;
      for (let k = 0; k < size; k += 1) {
        const inverse = 1 / v[diag[k]!]!;
        inversePivot[k] = inverse;
        const from = ptr[k]!;
        const to = ptr[k + 1]!;
        for (let a = from; a < to; a += 1) v[low[a]!] = v[low[a]!]! * inverse;
        const end = u + 3 * (to - from) * (to - from);
        for (; u < end; u += 3) v[updates[u]!] = v[updates[u]!]! - v[updates[u + 1]!]! * v[updates[u + 2]!]!;
      }
    },
    solve(b, v, inversePivot) {
      for (let k = 0; k < size; k += 1) w[k] = b[perm[k]!]!;
      for (let k = 0; k < size; k += 1) {
        const wk = w[k]!;
        for (let a = ptr[k]!, to = ptr[k + 1]!; a < to; a += 1) w[index[a]!] = w[index[a]!]! - v[low[a]!]! * wk;
      }
      for (let k = size - 1; k >= 0; k -= 1) {
        let sum = w[k]!;
        for (let c = ptr[k]!, to = ptr[k + 1]!; c < to; c += 1) sum -= v[up[c]!]! * w[index[c]!]!;
        w[k] = sum * inversePivot[k]!;
        b[perm[k]!] = w[k]!;
      }
    },
  };
}

export class SparseLu {
  readonly size: number;
  /** Values of every stored entry of the permuted matrix (diagonal, upper, lower). */
  readonly values: Float64Array;
  /** Elimination order: order position → original index. */
  readonly perm: Int32Array;
  private readonly inv: Int32Array;
  private readonly slotOf: ReadonlyMap<number, number>;
  private readonly kernels: Kernels;
  /** Which form the numeric work takes here. */
  readonly form: 'straight-line' | 'loops';
  /** 1 / pivot of each order position, kept by factor() so that the solves multiply instead of dividing. */
  private readonly inversePivot: Float64Array;

  /**
   * `pattern` lists the off-diagonal (row, column) pairs that can be non-zero, in original
   * indices. `loops` keeps the loop form of the numeric work (the tests compare the two).
   */
  constructor(size: number, pattern: ReadonlyArray<readonly [number, number]>, options: { loops?: boolean } = {}) {
    const symbolic = symbolicOf(size, pattern);
    this.size = size;
    this.perm = symbolic.perm;
    this.inv = symbolic.inv;
    this.slotOf = symbolic.slotOf;
    this.kernels = options.loops ? loopKernels(symbolic) : symbolic.kernels;
    this.form = options.loops ? 'loops' : symbolic.kernels.form;
    this.values = new Float64Array(symbolic.slots);
    this.inversePivot = new Float64Array(size);
  }

  /** Slot of entry (row, col) in original indices; -1 when it is structurally zero. */
  slot(row: number, col: number): number {
    return this.slotOf.get(this.inv[row]! * this.size + this.inv[col]!) ?? -1;
  }

  /** Factorises the current values in place. */
  factor(): void {
    this.kernels.factor(this.values, this.inversePivot);
  }

  /** Solves (LU) x = b in place (b and x in the original order). */
  solve(b: Float64Array): void {
    this.kernels.solve(b, this.values, this.inversePivot);
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
