import { ISO_LINEAR_REGION_EPSILON, isoFlowSource } from '../calc/iso6358';
import type { World } from './world';

/**
 * A partition's right-hand side: `values(y, f, w, indices, numbers)` writes the pressures, volumes
 * and flows at the state y into the world and the rates into f, and returns false when a mass went
 * negative (positions must already be written); `withDerivatives` also writes the flows' and
 * pressures' derivatives for the Jacobian. Both are shared between partitions of one structure;
 * `indices` and `numbers` are this partition's.
 */
export interface RightHandSide {
  values: Written;
  withDerivatives: Written;
  indices: Int32Array;
  numbers: Float64Array;
}

/** What a partition's right-hand side is made of, with global and local (row) indices. */
export interface RightHandSideShape {
  nState: number;
  rt: number;
  ambientPa: number;
  freeNodes: ReadonlyArray<{
    node: number;
    row: number;
    baseVolume: number;
    exponent: number;
    /** Chamber terms: volume offset + area × position (clamped to the stroke). */
    chambers: ReadonlyArray<{ piston: number; area: number; offset: number; stroke: number }>;
  }>;
  restrictions: ReadonlyArray<{
    r: number;
    from: number;
    to: number;
    rowFrom: number;
    rowTo: number;
    critical: number;
    cracking: number;
    oneWay: boolean;
    modulated: boolean;
    linearPhi: number;
  }>;
  pistons: ReadonlyArray<{ k: number; x: number; v: number }>;
}

/** The written form of one structure: it reads the partition's indices from `ix` and its numbers from `cs`. */
type Written = (y: Float64Array, f: Float64Array, w: World, ix: Int32Array, cs: Float64Array) => boolean;

/** Functions written so far, by structure: partitions alike but for their numbers (repeated cells, every run of a circuit) share one. */
const written = new Map<string, { values: Written; withDerivatives: Written }>();
const WRITTEN_LIMIT = 256;

/**
 * The right-hand side of one partition written out as straight-line code, once without and once
 * with derivatives: no loops over index lists, the flow law written in place, every index and
 * constant read from two flat arrays at fixed positions. The partition evaluates it three or four
 * times a step attempt, and the loop form (Partition.evaluate) spends more on loading indices,
 * testing flags and calling than on the arithmetic. The code depends only on the partition's
 * structure (which rows a passage joins, which passages are one-way or modulated, how many
 * chambers a node has), so partitions that differ only in their numbers share it and the amount
 * of code stays small. The operations and their order are those of the loop form, so the two
 * give the same results bit for bit. Null where the platform forbids compiling code at run time
 * (a strict content security policy).
 */
export function straightLineRightHandSide(shape: RightHandSideShape): RightHandSide | null {
  const ix: number[] = [];
  const cs: number[] = [];
  const key = structureKey(shape);
  let functions = written.get(key);
  if (!functions) {
    let made: { values: Written; withDerivatives: Written };
    try {
      made = { values: compiled(body(shape, false)), withDerivatives: compiled(body(shape, true)) };
    } catch {
      return null;
    }
    if (written.size >= WRITTEN_LIMIT) written.delete(written.keys().next().value!);
    written.set(key, made);
    functions = made;
  }
  fillNumbers(shape, ix, cs);
  // Named fields rather than a spread: the partition reads them at every evaluation, and spread copies do not share a shape.
  return { values: functions.values, withDerivatives: functions.withDerivatives, indices: Int32Array.from(ix), numbers: Float64Array.from(cs) };
}

function compiled(source: string): Written {
  return new Function('y', 'f', 'w', 'ix', 'cs', `${source}\n//# sourceURL=written-right-hand-side.js`) as Written;
}

/** Everything the written code depends on besides the numbers in ix and cs. */
function structureKey(shape: RightHandSideShape): string {
  const nodes = shape.freeNodes.map((n) => `${n.row}:${n.exponent === 1 ? 'i' : 'p'}:${n.chambers.length}`).join(',');
  const passages = shape.restrictions.map((r) => `${r.rowFrom}>${r.rowTo}${r.oneWay ? 'o' : ''}${r.modulated ? 'm' : ''}`).join(',');
  const pistons = shape.pistons.map((p) => `${p.x}/${p.v}`).join(',');
  return `${shape.nState}|${nodes}|${passages}|${pistons}`;
}

/** The partition's indices and numbers in the order body() reads them. */
function fillNumbers(shape: RightHandSideShape, ix: number[], cs: number[]): void {
  cs.push(shape.rt, shape.ambientPa);
  for (const node of shape.freeNodes) {
    ix.push(node.node);
    cs.push(node.baseVolume, node.exponent);
    for (const c of node.chambers) {
      ix.push(c.piston);
      cs.push(c.offset, c.area, c.stroke);
    }
  }
  for (const r of shape.restrictions) {
    ix.push(r.r, r.from, r.to);
    cs.push(r.cracking, r.critical, 1 - r.critical, r.linearPhi);
  }
  for (const p of shape.pistons) ix.push(p.k);
}

function body(shape: RightHandSideShape, derivatives: boolean): string {
  let i = 0;
  let c = 0;
  const nextIndex = () => `ix[${i++}]`;
  const nextNumber = () => `cs[${c++}]`;
  const lines: string[] = [
    'const pressure = w.pressure, volume = w.volume, ppm = w.pressurePerMass, position = w.position;',
    'const opening = w.opening, gain = w.gain, flow = w.flow, dA = w.dFlowA, dB = w.dFlowB, dC = w.dFlowC;',
    `const rt = ${nextNumber()}, ambient = ${nextNumber()};`,
    'let physical = true;',
  ];
  for (const node of shape.freeNodes) {
    lines.push('{', `const node = ${nextIndex()};`, `let v = ${nextNumber()};`, `const exponent = ${nextNumber()};`);
    for (let n = 0; n < node.chambers.length; n += 1) {
      lines.push(`{ const x = position[${nextIndex()}]; const offset = ${nextNumber()}, area = ${nextNumber()}, stroke = ${nextNumber()}; v += offset + area * (x < 0 ? 0 : x > stroke ? stroke : x); }`);
    }
    lines.push('volume[node] = v;', `const m = y[${node.row}];`, 'if (m <= 0) physical = false;', 'const mass = m > 1e-15 ? m : 1e-15;', 'const isothermal = (mass * rt) / v;');
    if (node.exponent === 1) {
      lines.push('pressure[node] = isothermal;');
      if (derivatives) lines.push('ppm[node] = rt / v;');
    } else {
      lines.push('const p = ambient * Math.pow(isothermal / ambient, exponent);', 'pressure[node] = p;', 'ppm[node] = (exponent * p) / mass;');
    }
    lines.push('}');
  }
  for (let row = 0; row < shape.nState; row += 1) lines.push(`f[${row}] = 0;`);
  for (const r of shape.restrictions) {
    const names = `const r = ${nextIndex()}, from = ${nextIndex()}, to = ${nextIndex()};`;
    const numbers = `const cracking = ${nextNumber()}, b = ${nextNumber()}, oneMinusB = ${nextNumber()}, linearPhi = ${nextNumber()};`;
    // A closed passage carries nothing; the partition zeroed its flow and derivatives when it closed.
    lines.push('{', names, 'if (opening[r] > 0) {', numbers, 'let k = opening[r];', 'let dk = 0;');
    if (r.modulated) {
      lines.push('const modulator = w.model.restrictions[r].modulator;', 'const mod = modulator.fn(pressure[modulator.control]);', 'dk = k * mod.dk;', 'k *= mod.k;');
    }
    lines.push('const pa = pressure[from] - cracking;', 'const pb = pressure[to];', 'const g = gain[r];');
    const open = r.oneWay ? ' && !(pa <= pb)' : '';
    const law = { gain: 'g', pa: 'pa', pb: 'pb', b: 'b', oneMinusB: 'oneMinusB', linearPhi: 'linearPhi', flow: 'unit' };
    if (!derivatives) {
      lines.push('let q = 0;', `if (k > 0${open}) {`, 'let unit = 0;', isoFlowSource(law, ISO_LINEAR_REGION_EPSILON), 'q = k * unit;', '}');
    } else {
      lines.push(
        'let q = 0; let da = 0; let db = 0; let dc = 0;',
        `if ((k > 0 || dk !== 0)${open}) {`,
        'let unit = 0; let unitA = 0; let unitB = 0;',
        isoFlowSource({ ...law, dPa: 'unitA', dPb: 'unitB' }, ISO_LINEAR_REGION_EPSILON),
        'q = k * unit; da = k * unitA; db = k * unitB; dc = dk * unit;',
        '}',
        'dA[r] = da; dB[r] = db; dC[r] = dc;',
      );
    }
    lines.push('flow[r] = q;', `f[${r.rowFrom}] = f[${r.rowFrom}] - q;`, `f[${r.rowTo}] = f[${r.rowTo}] + q;`, '}', '}');
  }
  for (const p of shape.pistons) {
    lines.push(
      '{',
      `const k = ${nextIndex()};`,
      "if (w.mode[k] === 'free') {",
      'const piston = w.model.pistons[k];',
      `const v = y[${p.v}];`,
      `f[${p.x}] = v;`,
      'const friction = w.direction[k] * piston.coulombN + piston.viscousNsPerM * v;',
      `f[${p.v}] = (w.driveForce(k) - friction) / piston.movingMassKg;`,
      '}',
      '}',
    );
  }
  lines.push('return physical;');
  return lines.join('\n');
}
