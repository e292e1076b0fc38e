import { ISO_LINEAR_REGION_EPSILON, signedIsoFlowInto } from '../calc/iso6358';
import { SparseLu } from './sparse-lu';
import type { World } from './world';

/** Events are located to within this time, s. */
export const EVENT_TOLERANCE_S = 1e-6;

// ROS2 (Verwer, Spee, Blom & Hundsdorfer 1999): second order, L-stable, and order 2
// with any approximation of the Jacobian (a W-method), which lets us leave out the
// derivatives of switching and of regulator openings with respect to position.
const GAMMA = 1 + 1 / Math.SQRT2;
const LINEAR_EPSILON = ISO_LINEAR_REGION_EPSILON;

/** Absolute tolerances of piston states: 0.01 mm and 1 mm/s. */
const POSITION_TOLERANCE_M = 1e-5;
const VELOCITY_TOLERANCE_M_PER_S = 1e-3;

/**
 * A partition whose masses all drift by less than this share of their tolerance per
 * second is treated as at rest: what is left to happen stays below the tolerance.
 */
const REST_DRIFT_PER_S = 0.05;

/** First step after a discrete change, s. */
const RESTART_STEP_S = 1e-5;

/**
 * A partition is an independent piece of the circuit: nodes joined by passages,
 * the pistons of their chambers, and the guards that read them. Boundary nodes
 * (atmosphere, ideal supplies) hold their pressure, so the pieces they join do
 * not interact and each can take the step sizes its own dynamics need.
 */
export interface PartitionSpec {
  freeNodes: number[];
  fixedNodes: number[];
  restrictions: number[];
  pistons: number[];
  /** Behaviours whose guards read this partition (and nothing outside it). */
  behaviours: number[];
  /** Boundary nodes those guards read: a change of their pressure is checked at once. */
  watchedBoundaries: number[];
}

export interface Tolerances {
  relTol: number;
  absTolPa: number;
  maxStepS: number;
}

/** The guards of one partition: piston end stops, stiction, and its behaviours' conditions. */
export interface GuardSource {
  /** Appends the partition's behaviour guard values, with their owners. */
  behaviourGuards(behaviours: readonly number[], out: number[], owners: number[]): void;
}

export class Partition {
  readonly spec: PartitionSpec;
  private readonly w: World;
  private readonly tol: Tolerances;
  private readonly guardSource: GuardSource;
  readonly nState: number;
  /** Local row of each restriction end (free node mass or boundary accumulator). */
  private readonly rowFrom: Int32Array;
  private readonly rowTo: Int32Array;
  private readonly localOfNode = new Map<number, number>();
  private readonly xIndex: Int32Array;
  private readonly vIndex: Int32Array;
  private readonly nMass: number;
  // Flat copies of the model for the inner loops (monomorphic, no closures).
  private readonly rIndex: Int32Array;
  private readonly rFromNode: Int32Array;
  private readonly rToNode: Int32Array;
  private readonly rCritical: Float64Array;
  private readonly rCracking: Float64Array;
  private readonly rOneWay: Uint8Array;
  private readonly rModulated: Uint8Array;
  private readonly rFromFree: Uint8Array;
  private readonly rToFree: Uint8Array;
  private readonly pIndex: Int32Array;

  private y: Float64Array;
  private f: Float64Array;
  private candidate: Float64Array;
  private fCandidate: Float64Array;
  private readonly stage: Float64Array;
  private readonly k1: Float64Array;
  private readonly k2: Float64Array;
  private fValid = false;
  private readonly scratch = { flow: 0, dFlowdPa: 0, dFlowdPb: 0 };
  private readonly lu: SparseLu;
  private readonly slots: { diag: Int32Array; restriction: Int32Array[]; chamberX: Array<Array<[number, number, number, number]>>; modulator: Int32Array[]; piston: Int32Array[] };

  time = 0;
  private h = 1e-5;
  quiescent = false;
  steps = 0;
  rejected = 0;
  /** Guard values at the committed state, and the local guard owners (behaviour, index) after the piston guards. */
  guardValues: number[] = [];
  guardOwners: number[] = [];
  /** Guards that crossed zero at the end of the last advance. */
  crossed: number[] = [];

  private readonly snapY: Float64Array;
  private snapTime = 0;
  private snapH = 0;
  private snapQuiescent = false;
  private snapGuards: number[] = [];
  private snapOwners: number[] = [];
  /** Guards must be recomputed before the next advance (something discrete changed). */
  dirty = true;
  /** A boundary pressure that its guards read has just changed. */
  boundaryChanged = false;

  constructor(world: World, spec: PartitionSpec, tol: Tolerances, guardSource: GuardSource) {
    this.w = world;
    this.spec = spec;
    this.tol = tol;
    this.guardSource = guardSource;
    const { restrictions } = world.model;
    let n = 0;
    for (const node of spec.freeNodes) this.localOfNode.set(node, n++);
    this.nMass = n;
    for (const node of spec.fixedNodes) this.localOfNode.set(node, n++);
    this.xIndex = new Int32Array(spec.pistons.length);
    this.vIndex = new Int32Array(spec.pistons.length);
    spec.pistons.forEach((_, j) => {
      this.xIndex[j] = n++;
      this.vIndex[j] = n++;
    });
    this.nState = n;
    this.rowFrom = Int32Array.from(spec.restrictions, (r) => this.localOfNode.get(restrictions[r]!.from)!);
    this.rowTo = Int32Array.from(spec.restrictions, (r) => this.localOfNode.get(restrictions[r]!.to)!);
    const nodes = world.model.nodes;
    this.rIndex = Int32Array.from(spec.restrictions);
    this.rFromNode = Int32Array.from(spec.restrictions, (r) => restrictions[r]!.from);
    this.rToNode = Int32Array.from(spec.restrictions, (r) => restrictions[r]!.to);
    this.rCritical = Float64Array.from(spec.restrictions, (r) => restrictions[r]!.criticalRatio);
    this.rCracking = Float64Array.from(spec.restrictions, (r) => (restrictions[r]!.oneWay ? (restrictions[r]!.crackingPa ?? 0) : 0));
    this.rOneWay = Uint8Array.from(spec.restrictions, (r) => (restrictions[r]!.oneWay ? 1 : 0));
    this.rModulated = Uint8Array.from(spec.restrictions, (r) => (restrictions[r]!.modulator ? 1 : 0));
    this.rFromFree = Uint8Array.from(spec.restrictions, (r) => (nodes[restrictions[r]!.from]!.fixed ? 0 : 1));
    this.rToFree = Uint8Array.from(spec.restrictions, (r) => (nodes[restrictions[r]!.to]!.fixed ? 0 : 1));
    this.pIndex = Int32Array.from(spec.pistons);
    this.y = new Float64Array(n);
    this.f = new Float64Array(n);
    this.candidate = new Float64Array(n);
    this.fCandidate = new Float64Array(n);
    this.stage = new Float64Array(n);
    this.k1 = new Float64Array(n);
    this.k2 = new Float64Array(n);
    this.snapY = new Float64Array(n);
    spec.freeNodes.forEach((node, i) => (this.y[i] = (world.pressure[node]! * world.volume[node]!) / world.rt));
    spec.pistons.forEach((k, j) => (this.y[this.xIndex[j]!] = world.position[k]!));
    this.quiescent = n === 0;
    const built = this.buildPattern();
    this.lu = built.lu;
    this.slots = built.slots;
  }

  /** Mass in the partition's nodes plus what its boundaries have received, kg (constant up to round-off). */
  airBudget(): number {
    let sum = 0;
    for (let i = 0; i < this.nMass + this.spec.fixedNodes.length; i += 1) sum += this.y[i]!;
    return sum;
  }

  /** Re-evaluates the committed state after a discrete change; wakes a quiescent partition. */
  wake(): void {
    this.quiescent = false;
    this.fValid = false;
    this.dirty = true;
    // A discontinuity: restart with a small step and let the controller grow it again.
    this.h = Math.min(this.h, RESTART_STEP_S);
  }

  refresh(): void {
    this.writePositions(this.y);
    this.evaluate(this.y, this.f);
    this.fValid = true;
  }

  /** Makes the world's arrays describe this partition's committed state. */
  ensureFresh(): void {
    if (!this.fValid) this.refresh();
  }


  /** Writes a changed piston position or velocity (an end stop) back into the local state. */
  setPiston(k: number, position: number, velocity: number): void {
    const j = this.spec.pistons.indexOf(k);
    this.y[this.xIndex[j]!] = position;
    this.y[this.vIndex[j]!] = velocity;
    this.wake();
  }

  snapshot(): void {
    this.snapTime = this.time;
    this.snapQuiescent = this.quiescent;
    if (this.quiescent) return;
    this.snapY.set(this.y);
    this.snapH = this.h;
    this.snapGuards = this.guardValues;
    this.snapOwners = this.guardOwners;
  }

  restore(): void {
    this.time = this.snapTime;
    this.crossed = [];
    if (this.snapQuiescent) return;
    this.y.set(this.snapY);
    this.h = this.snapH;
    this.quiescent = false;
    this.guardValues = this.snapGuards;
    this.guardOwners = this.snapOwners;
    this.fValid = false;
  }

  /** Guard values at the committed state (the world must describe it). */
  computeGuards(): void {
    if (!this.fValid) this.refresh();
    this.guardValues = [];
    this.guardOwners = [];
    this.collectGuards(this.guardValues, this.guardOwners);
    this.dirty = false;
  }

  /**
   * Integrates from `time` to `until`, stopping early at the first guard
   * crossing (then `crossed` lists the guards). A quiescent partition only moves its clock.
   */
  advanceTo(until: number): void {
    this.crossed = [];
    if (this.quiescent) {
      this.time = until;
      return;
    }
    while (this.time < until - 1e-12) {
      if (this.step(until) !== 'continue') return;
    }
    this.time = until;
  }

  /** One accepted step: it may end on a guard crossing, or find the partition at rest (then it jumps to `stop`). */
  private step(stop: number): 'continue' | 'crossed' | 'quiescent' {
    let h = Math.min(this.h, this.tol.maxStepS, stop - this.time);
    for (;;) {
      const landsOnStop = h >= stop - this.time - 1e-15;
      const trial = this.rosenbrock(h);
      if (!trial.ok || trial.err > 1) {
        this.rejected += 1;
        this.fValid = false;
        h *= trial.ok ? Math.max(0.2, 0.9 / Math.sqrt(trial.err)) : 0.25;
        if (h < 1e-12) throw new Error('step size underflow: the circuit could not be integrated');
        continue;
      }
      const after: number[] = [];
      const owners: number[] = [];
      this.collectGuards(after, owners);
      let theta = 1;
      const crossed: number[] = [];
      const before = this.guardValues;
      for (let i = 0; i < after.length; i += 1) {
        const g0 = before[i]!;
        const g1 = after[i]!;
        if ((g0 < 0 && g1 >= 0) || (g0 > 0 && g1 <= 0)) {
          crossed.push(i);
          theta = Math.min(theta, g0 / (g0 - g1));
        }
      }
      if (crossed.length && (1 - theta) * h > EVENT_TOLERANCE_S && h > EVENT_TOLERANCE_S) {
        this.fValid = false;
        this.writePositions(this.y);
        h = Math.max(theta * h + EVENT_TOLERANCE_S / 2, EVENT_TOLERANCE_S / 2);
        continue;
      }
      this.steps += 1;
      this.time = landsOnStop ? stop : this.time + h;
      const y = this.y;
      this.y = this.candidate;
      this.candidate = y;
      const f = this.f;
      this.f = this.fCandidate;
      this.fCandidate = f;
      this.fValid = true;
      this.guardValues = after;
      this.guardOwners = owners;
      const grow = trial.err > 0 ? Math.min(4, Math.max(0.2, 0.9 / Math.sqrt(trial.err))) : 4;
      this.h = Math.max(h * grow, 1e-9);
      if (crossed.length) {
        this.crossed = crossed;
        return 'crossed';
      }
      this.quiescent = this.isQuiescent();
      if (!this.quiescent) return 'continue';
      // Frozen from here on: the little flow left moves no air in the model, so none is reported.
      for (let j = 0; j < this.rIndex.length; j += 1) this.w.flow[this.rIndex[j]!] = 0;
      this.time = stop;
      return 'quiescent';
    }
  }

  /** Nothing moves and no mass drifts noticeably: the state can stand still until something wakes it. */
  private isQuiescent(): boolean {
    for (const k of this.spec.pistons) if (this.w.mode[k] === 'free') return false;
    for (let i = 0; i < this.nMass; i += 1) {
      if (Math.abs(this.f[i]!) > REST_DRIFT_PER_S * this.massScale(i, 0)) return false;
    }
    return true;
  }

  private massScale(i: number, magnitude: number): number {
    const node = this.spec.freeNodes[i]!;
    return (this.tol.absTolPa * this.w.volume[node]!) / this.w.rt + this.tol.relTol * magnitude;
  }

  private rosenbrock(h: number): { ok: boolean; err: number } {
    const n = this.nState;
    const y0 = this.y;
    if (!this.fValid) this.refresh();
    this.assembleW(h);
    this.lu.factor();
    const k1 = this.k1;
    k1.set(this.f);
    this.lu.solve(k1);
    const y1 = this.stage;
    for (let i = 0; i < n; i += 1) y1[i] = y0[i]! + h * k1[i]!;
    const k2 = this.k2;
    this.writePositions(y1);
    if (!this.evaluate(y1, k2)) return { ok: false, err: Infinity };
    for (let i = 0; i < n; i += 1) k2[i] = k2[i]! - 2 * k1[i]!;
    this.lu.solve(k2);
    const yNew = this.candidate;
    // Error of the embedded first-order solution, filtered through W⁻¹ (Shampine's device) so
    // that stiff, well-damped components (tiny tube volumes) do not dictate the step size.
    const err = this.stage;
    for (let i = 0; i < n; i += 1) {
      yNew[i] = y0[i]! + 1.5 * h * k1[i]! + 0.5 * h * k2[i]!;
      err[i] = 0.5 * h * (k1[i]! + k2[i]!);
    }
    this.lu.solve(err);
    let errSq = 0;
    let counted = 0;
    const firstPiston = this.nMass + this.spec.fixedNodes.length;
    for (let i = 0; i < n; i += 1) {
      const magnitude = Math.max(Math.abs(y0[i]!), Math.abs(yNew[i]!));
      let scale: number;
      if (i < this.nMass) scale = this.massScale(i, magnitude);
      else if (i < firstPiston) continue;
      else scale = ((i - firstPiston) % 2 === 0 ? POSITION_TOLERANCE_M : VELOCITY_TOLERANCE_M_PER_S) + this.tol.relTol * magnitude;
      const e = err[i]! / scale;
      errSq += e * e;
      counted += 1;
    }
    this.writePositions(yNew);
    const ok = this.evaluate(yNew, this.fCandidate);
    return { ok, err: counted ? Math.sqrt(errSq / counted) : 0 };
  }

  private writePositions(y: Float64Array): void {
    const w = this.w;
    for (let j = 0; j < this.pIndex.length; j += 1) {
      const k = this.pIndex[j]!;
      w.position[k] = y[this.xIndex[j]!]!;
      w.velocity[k] = y[this.vIndex[j]!]!;
    }
  }

  /** Pressures, flows and derivatives at y (positions already written); false if a mass went negative. */
  private evaluate(y: Float64Array, f: Float64Array): boolean {
    const w = this.w;
    const pressure = w.pressure;
    let physical = true;
    const free = this.spec.freeNodes;
    for (let i = 0; i < free.length; i += 1) {
      const node = free[i]!;
      const v = w.nodeVolume(node);
      w.volume[node] = v;
      const m = y[i]!;
      if (m <= 0) physical = false;
      pressure[node] = ((m > 1e-15 ? m : 1e-15) * w.rt) / v;
    }
    f.fill(0);
    const scratch = this.scratch;
    const restrictions = w.model.restrictions;
    const count = this.rIndex.length;
    for (let j = 0; j < count; j += 1) {
      const r = this.rIndex[j]!;
      let k = w.opening[r]!;
      let dk = 0;
      if (this.rModulated[j]) {
        const modulator = restrictions[r]!.modulator!;
        const mod = modulator.fn(pressure[modulator.control]!);
        dk = k * mod.dk;
        k *= mod.k;
      }
      const pa = pressure[this.rFromNode[j]!]! - this.rCracking[j]!;
      const pb = pressure[this.rToNode[j]!]!;
      let q = 0;
      let da = 0;
      let db = 0;
      let dc = 0;
      if ((k > 0 || dk !== 0) && !(this.rOneWay[j] && pa <= pb)) {
        signedIsoFlowInto(scratch, w.gain[r]!, this.rCritical[j]!, 0.5, pa, pb, LINEAR_EPSILON);
        q = k * scratch.flow;
        da = k * scratch.dFlowdPa;
        db = k * scratch.dFlowdPb;
        dc = dk * scratch.flow;
      }
      w.flow[r] = q;
      w.dFlowA[r] = da;
      w.dFlowB[r] = db;
      w.dFlowC[r] = dc;
      const a = this.rowFrom[j]!;
      const b = this.rowTo[j]!;
      f[a] = f[a]! - q;
      f[b] = f[b]! + q;
    }
    const pistons = w.model.pistons;
    for (let j = 0; j < this.pIndex.length; j += 1) {
      const k = this.pIndex[j]!;
      if (w.mode[k] !== 'free') continue;
      const p = pistons[k]!;
      const v = y[this.vIndex[j]!]!;
      f[this.xIndex[j]!] = v;
      const friction = w.direction[k]! * p.coulombN + p.viscousNsPerM * v;
      f[this.vIndex[j]!] = (w.driveForce(k) - friction) / p.movingMassKg;
    }
    return physical;
  }

  private collectGuards(out: number[], owners: number[]): void {
    const w = this.w;
    for (const k of this.spec.pistons) {
      const p = w.model.pistons[k]!;
      const x = w.position[k]!;
      const drive = w.driveForce(k);
      switch (w.mode[k]) {
        case 'free':
          out.push(x, p.strokeM - x, w.velocity[k]! * w.direction[k]! + 1e-12);
          break;
        case 'end-min':
          out.push(drive - p.breakawayN, -1, -1);
          break;
        case 'end-max':
          out.push(-drive - p.breakawayN, -1, -1);
          break;
        case 'stuck':
          out.push(drive - p.breakawayN, -drive - p.breakawayN, -1);
          break;
      }
    }
    this.guardSource.behaviourGuards(this.spec.behaviours, out, owners);
  }

  /** Number of piston guards at the front of the guard list (three per piston). */
  get pistonGuardCount(): number {
    return this.spec.pistons.length * 3;
  }

  // ---- Jacobian -------------------------------------------------------------

  private buildPattern(): { lu: SparseLu; slots: Partition['slots'] } {
    const { restrictions, pistons, nodes } = this.w.model;
    const local = (node: number) => this.localOfNode.get(node)!;
    const pistonLocal = new Map(this.spec.pistons.map((k, j) => [k, j]));
    const pairs: Array<[number, number]> = [];
    this.spec.restrictions.forEach((r, j) => {
      const spec = restrictions[r]!;
      const a = this.rowFrom[j]!;
      const b = this.rowTo[j]!;
      pairs.push([a, b]);
      for (const end of [spec.from, spec.to]) {
        for (const c of nodes[end]!.chambers) pairs.push([a, this.xIndex[pistonLocal.get(c.piston)!]!], [b, this.xIndex[pistonLocal.get(c.piston)!]!]);
      }
      if (spec.modulator) pairs.push([a, local(spec.modulator.control)], [b, local(spec.modulator.control)]);
    });
    this.spec.pistons.forEach((k, j) => {
      const p = pistons[k]!;
      const x = this.xIndex[j]!;
      const v = this.vIndex[j]!;
      pairs.push([x, v], [v, local(p.capNode)], [v, x]);
      if (p.rodNode !== null) pairs.push([v, local(p.rodNode)]);
    });
    const lu = new SparseLu(this.nState, pairs);
    const diag = Int32Array.from({ length: this.nState }, (_, i) => lu.slot(i, i));
    const restriction = this.spec.restrictions.map((_, j) => {
      const a = this.rowFrom[j]!;
      const b = this.rowTo[j]!;
      return Int32Array.of(lu.slot(a, a), lu.slot(a, b), lu.slot(b, a), lu.slot(b, b));
    });
    const chamberX = this.spec.restrictions.map((r, j) => {
      const spec = restrictions[r]!;
      return [spec.from, spec.to].flatMap((end, e) =>
        nodes[end]!.chambers.map((c) => {
          const x = this.xIndex[pistonLocal.get(c.piston)!]!;
          return [lu.slot(this.rowFrom[j]!, x), lu.slot(this.rowTo[j]!, x), c.piston, e] as [number, number, number, number];
        }),
      );
    });
    const modulator = this.spec.restrictions.map((r, j) => {
      const spec = restrictions[r]!;
      return spec.modulator ? Int32Array.of(lu.slot(this.rowFrom[j]!, local(spec.modulator.control)), lu.slot(this.rowTo[j]!, local(spec.modulator.control))) : new Int32Array(0);
    });
    const piston = this.spec.pistons.map((k, j) => {
      const p = pistons[k]!;
      const x = this.xIndex[j]!;
      const v = this.vIndex[j]!;
      return Int32Array.of(lu.slot(x, v), lu.slot(v, local(p.capNode)), p.rodNode === null ? -1 : lu.slot(v, local(p.rodNode)), lu.slot(v, x), lu.slot(v, v));
    });
    return { lu, slots: { diag, restriction, chamberX, modulator, piston } };
  }

  /** ∂p/∂m of a node (0 for boundary nodes). */
  private dpdm(node: number): number {
    return this.w.model.nodes[node]!.fixed ? 0 : this.w.rt / this.w.volume[node]!;
  }

  /** ∂p/∂x of a node through the chamber of piston k. */
  private dpdx(node: number, k: number): number {
    const p = this.w.model.pistons[k]!;
    let dv = 0;
    for (const c of this.w.model.nodes[node]!.chambers) if (c.piston === k) dv += c.side === 'cap' ? p.capArea : -p.rodSideArea;
    return (-this.w.pressure[node]! / this.w.volume[node]!) * dv;
  }

  /** W = I − γhJ at the committed state (the world's work arrays must describe it). */
  private assembleW(h: number): void {
    const v = this.lu.values;
    const c = -GAMMA * h;
    const w = this.w;
    const rt = w.rt;
    v.fill(0);
    const diag = this.slots.diag;
    for (let i = 0; i < diag.length; i += 1) v[diag[i]!] = 1;
    const { restrictions, pistons } = w.model;
    for (let j = 0; j < this.rIndex.length; j += 1) {
      const r = this.rIndex[j]!;
      const slots = this.slots.restriction[j]!;
      const from = this.rFromNode[j]!;
      const to = this.rToNode[j]!;
      // dm_from/dt = −q and dm_to/dt = +q; ∂p/∂m = RT/V on free nodes, 0 on boundaries.
      const ja = this.rFromFree[j] ? (w.dFlowA[r]! * rt) / w.volume[from]! : 0;
      const jb = this.rToFree[j] ? (w.dFlowB[r]! * rt) / w.volume[to]! : 0;
      v[slots[0]!] = v[slots[0]!]! - c * ja;
      v[slots[2]!] = v[slots[2]!]! + c * ja;
      v[slots[1]!] = v[slots[1]!]! - c * jb;
      v[slots[3]!] = v[slots[3]!]! + c * jb;
      const couplings = this.slots.chamberX[j]!;
      for (let n = 0; n < couplings.length; n += 1) {
        const coupling = couplings[n]!;
        const k = coupling[2];
        if (w.mode[k] !== 'free') continue;
        const node = coupling[3] === 0 ? from : to;
        const jx = (coupling[3] === 0 ? w.dFlowA[r]! : w.dFlowB[r]!) * this.dpdx(node, k);
        v[coupling[0]] = v[coupling[0]]! - c * jx;
        v[coupling[1]] = v[coupling[1]]! + c * jx;
      }
      if (this.rModulated[j]) {
        const mod = this.slots.modulator[j]!;
        const jc = w.dFlowC[r]! * this.dpdm(restrictions[r]!.modulator!.control);
        v[mod[0]!] = v[mod[0]!]! - c * jc;
        v[mod[1]!] = v[mod[1]!]! + c * jc;
      }
    }
    for (let j = 0; j < this.pIndex.length; j += 1) {
      const k = this.pIndex[j]!;
      if (w.mode[k] !== 'free') continue;
      const p = pistons[k]!;
      const slots = this.slots.piston[j]!;
      const mass = p.movingMassKg;
      v[slots[0]!] = v[slots[0]!]! + c;
      v[slots[1]!] = v[slots[1]!]! + (c * p.capArea * this.dpdm(p.capNode)) / mass;
      if (p.rodNode !== null) v[slots[2]!] = v[slots[2]!]! - (c * p.rodSideArea * this.dpdm(p.rodNode)) / mass;
      const dFdx = p.capArea * this.dpdx(p.capNode, k) - (p.rodNode === null ? 0 : p.rodSideArea * this.dpdx(p.rodNode, k)) - p.springRateNPerM;
      v[slots[3]!] = v[slots[3]!]! + (c * dFdx) / mass;
      v[slots[4]!] = v[slots[4]!]! + (c * -p.viscousNsPerM) / mass;
    }
  }
}
