import type { World } from './world';

/**
 * Assembles a partition's iteration matrix W = I − γhJ into the LU's value array, given
 * c = −γh: `assemble(values, c, w, indices, numbers)`. The function is shared by partitions of
 * one structure; `indices` and `numbers` are this partition's.
 */
export interface IterationMatrix {
  assemble: Written;
  indices: Int32Array;
  numbers: Float64Array;
}

type Written = (v: Float64Array, c: number, w: World, ix: Int32Array, cs: Float64Array) => void;

/** Where each Jacobian term of a partition goes in the LU's value array (slots), and what it reads. */
export interface IterationMatrixShape {
  slotCount: number;
  diagonal: ArrayLike<number>;
  restrictions: ReadonlyArray<{
    r: number;
    from: number;
    to: number;
    fromFree: boolean;
    toFree: boolean;
    /** Slots (a,a), (a,b), (b,a), (b,b) of its rows a and b. */
    slots: readonly [number, number, number, number];
    /** Chambers at its ends whose piston's position moves their pressure. */
    couplings: ReadonlyArray<{ piston: number; fromEnd: boolean; exponent: number; dvdx: number; slots: readonly [number, number] }>;
    /** Slots of the two rows against the modulator's control node, when modulated. */
    modulator: readonly [number, number] | null;
  }>;
  pistons: ReadonlyArray<{ k: number; slots: readonly [number, number, number, number, number]; hasRod: boolean; dvdxCap: number; dvdxRod: number }>;
}

const written = new Map<string, Written>();
const WRITTEN_LIMIT = 256;

/**
 * W of one partition written out as straight-line code: every slot a literal, no loops over the
 * slot lists. The code depends only on the structure (slots, which ends are free, which passages
 * are modulated, which chambers couple), so partitions alike but for their numbers share it. The
 * operations and their order are those of the loop form (Partition.assembleW), so the two give the
 * same matrix bit for bit. Null where the platform forbids compiling code at run time.
 */
export function straightLineIterationMatrix(shape: IterationMatrixShape): IterationMatrix | null {
  let key = `${shape.slotCount}|${Array.prototype.join.call(shape.diagonal)}`;
  for (const r of shape.restrictions) {
    key += `|${r.fromFree ? 'f' : 'x'}${r.toFree ? 'f' : 'x'}${r.slots.join()}:${r.modulator ? r.modulator.join() : ''}`;
    for (const c of r.couplings) key += `:${c.fromEnd ? 'a' : 'b'}${c.slots.join()}`;
  }
  for (const p of shape.pistons) key += `|${p.slots.join()}${p.hasRod ? 'r' : ''}`;
  let assemble = written.get(key);
  if (!assemble) {
    try {
      assemble = new Function('v', 'c', 'w', 'ix', 'cs', `${body(shape)}\n//# sourceURL=written-iteration-matrix.js`) as Written;
    } catch {
      return null;
    }
    if (written.size >= WRITTEN_LIMIT) written.delete(written.keys().next().value!);
    written.set(key, assemble);
  }
  const ix: number[] = [];
  const cs: number[] = [];
  for (const r of shape.restrictions) {
    ix.push(r.r, r.from, r.to);
    for (const c of r.couplings) {
      ix.push(c.piston);
      cs.push(c.exponent, c.dvdx);
    }
  }
  for (const p of shape.pistons) {
    ix.push(p.k);
    cs.push(p.dvdxCap, p.dvdxRod);
  }
  return { assemble, indices: Int32Array.from(ix), numbers: Float64Array.from(cs) };
}

function body(shape: IterationMatrixShape): string {
  let i = 0;
  let n = 0;
  const nextIndex = () => `ix[${i++}]`;
  const nextNumber = () => `cs[${n++}]`;
  const lines = [
    'const ppm = w.pressurePerMass, pressure = w.pressure, volume = w.volume, mode = w.mode, isFixed = w.isFixed;',
    'const opening = w.opening, dA = w.dFlowA, dB = w.dFlowB, dC = w.dFlowC;',
  ];
  for (let s = 0; s < shape.slotCount; s += 1) lines.push(`v[${s}] = 0;`);
  for (let d = 0; d < shape.diagonal.length; d += 1) lines.push(`v[${shape.diagonal[d]}] = 1;`);
  const add = (slot: number, sign: '+' | '-', term: string) => `v[${slot}] = v[${slot}] ${sign} ${term};`;
  for (const r of shape.restrictions) {
    const [aa, ab, ba, bb] = r.slots;
    // Only passages that can carry flow contribute; a closed one's derivatives are zero.
    lines.push('{', `const r = ${nextIndex()}, from = ${nextIndex()}, to = ${nextIndex()};`, 'if (opening[r] > 0) {');
    lines.push(
      `const ja = ${r.fromFree ? 'dA[r] * ppm[from]' : '0'};`,
      `const jb = ${r.toFree ? 'dB[r] * ppm[to]' : '0'};`,
      add(aa, '-', 'c * ja'),
      add(ba, '+', 'c * ja'),
      add(ab, '-', 'c * jb'),
      add(bb, '+', 'c * jb'),
    );
    for (const c of r.couplings) {
      const node = c.fromEnd ? 'from' : 'to';
      lines.push(
        `if (mode[${nextIndex()}] === 'free') {`,
        `const exponent = ${nextNumber()}, dvdx = ${nextNumber()};`,
        `const dpdx = ((-exponent * pressure[${node}]) / volume[${node}]) * dvdx;`,
        `const jx = ${c.fromEnd ? 'dA[r]' : 'dB[r]'} * dpdx;`,
        add(c.slots[0], '-', 'c * jx'),
        add(c.slots[1], '+', 'c * jx'),
        '}',
      );
    }
    if (r.modulator) {
      lines.push(
        'const control = w.model.restrictions[r].modulator.control;',
        'const jc = dC[r] * (isFixed[control] ? 0 : ppm[control]);',
        add(r.modulator[0], '-', 'c * jc'),
        add(r.modulator[1], '+', 'c * jc'),
      );
    }
    lines.push('}', '}');
  }
  for (const p of shape.pistons) {
    const [sx, sCap, sRod, sPos, sVel] = p.slots;
    lines.push(
      '{',
      `const k = ${nextIndex()};`,
      `const dvdxCap = ${nextNumber()}, dvdxRod = ${nextNumber()};`,
      "if (mode[k] === 'free') {",
      'const p = w.model.pistons[k];',
      'const mass = p.movingMassKg;',
      'const cap = p.capNode;',
      add(sx, '+', 'c'),
      add(sCap, '+', '(c * p.capArea * (isFixed[cap] ? 0 : ppm[cap])) / mass'),
    );
    if (p.hasRod) lines.push('const rod = p.rodNode;', add(sRod, '-', '(c * p.rodSideArea * (isFixed[rod] ? 0 : ppm[rod])) / mass'));
    lines.push(
      'const capExponent = w.model.nodes[cap].polytropicExponent ?? 1;',
      'let dFdx = (p.capArea * (-capExponent * pressure[cap]) * dvdxCap) / volume[cap] - p.springRateNPerM;',
    );
    if (p.hasRod) {
      lines.push('const rodExponent = w.model.nodes[rod].polytropicExponent ?? 1;', 'dFdx -= (p.rodSideArea * (-rodExponent * pressure[rod]) * dvdxRod) / volume[rod];');
    }
    lines.push(add(sPos, '+', '(c * dFdx) / mass'), add(sVel, '+', '(c * -p.viscousNsPerM) / mass'), '}', '}');
  }
  return lines.join('\n');
}
