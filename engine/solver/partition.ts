import { ISO_LINEAR_REGION_EPSILON, isoLinearRegionPhi, signedIsoFlowPrepared, signedIsoFlowPreparedInto } from '../calc/iso6358';
import { type IterationMatrix, type IterationMatrixShape, straightLineIterationMatrix } from './iteration-matrix';
import { type RightHandSide, type RightHandSideShape, straightLineRightHandSide } from './right-hand-side';
import { SparseLu } from './sparse-lu';
import { flags, floats, ints } from './typed-arrays';
import type { World } from './world';

/** Events are located to within this time, s. */
export const EVENT_TOLERANCE_S = 1e-6;

/** The (never modified) empty crossing list, so that a step without crossings allocates nothing. */
const NO_CROSSINGS: readonly number[] = [];

// ROS34PW2 (J. Rang & L. Angermann, "New Rosenbrock W-methods of order 3 for partial
// differential algebraic equations of index 1", BIT Numer. Math. 45 (2005) 761–787):
// four stages, order 3 with an embedded order-2 solution, L-stable and stiffly accurate,
// and a W-method — its orders hold with any approximation of the Jacobian, which lets us
// leave out the derivatives of switching and of regulator openings with respect to position.
// Coefficients in the form (I − γhJ)k_i = h·f(y + Σ α_ij k_j) + hJ·Σ γ_ij k_j. The embedded
// weights satisfy Σ b̂ = 1, Σ b̂_i α_i = 1/2 and Σ b̂_i γ'_i = −γ to round-off, and the orders
// (3, embedded 2, with exact, zero and wrong Jacobians) are measured in
// tests/engine/solver/rosenbrock-order.test.ts.
const GAMMA = 0.435866521508459;
const ALPHA: readonly (readonly number[])[] = [[], [0.871733043016918], [0.84457060015369423, -0.11299064236484185], [0, 0, 1]];
const GAMMA_IJ: readonly (readonly number[])[] = [[], [-0.871733043016918], [-0.90338057013044082, 0.054180672388095326], [0.24212380706095346, -1.2232505839045147, 0.54526025533510214]];
const B = [0.24212380706095346, -1.2232505839045147, 1.545260255335102, 0.435866521508459];
const B_EMBEDDED = [0.37810903145819369, -0.096042292212423178, 0.5, 0.2179332607542295];

/**
 * The tableau in the variables u_i = Σ_{j≤i} γ_ij k_j (Hairer & Wanner, Solving ODEs II, §IV.7),
 * which need no Jacobian–vector products: (I − γhJ)u_i = γh·f(y + Σ a_ij u_j) + Σ c_ij u_j,
 * y_new = y + Σ m_j u_j, error estimate Σ e_j u_j. Worked out once from the published table.
 */
export const ROS34PW2 = (() => {
  const s = 4;
  const g = Array.from({ length: s }, (_, i) => Array.from({ length: s }, (_, j) => (i === j ? GAMMA : j < i ? GAMMA_IJ[i]![j]! : 0)));
  // Inverse of the lower-triangular Γ by forward substitution.
  const inv = Array.from({ length: s }, () => new Array<number>(s).fill(0));
  for (let i = 0; i < s; i += 1) {
    inv[i]![i] = 1 / GAMMA;
    for (let j = 0; j < i; j += 1) {
      let sum = 0;
      for (let k = j; k < i; k += 1) sum += g[i]![k]! * inv[k]![j]!;
      inv[i]![j] = -sum / GAMMA;
    }
  }
  const a = Array.from({ length: s }, (_, i) => Array.from({ length: i }, (_, j) => {
    let sum = 0;
    for (let k = j; k < i; k += 1) sum += ALPHA[i]![k]! * inv[k]![j]!;
    return sum;
  }));
  const c = Array.from({ length: s }, (_, i) => Array.from({ length: i }, (_, j) => -GAMMA * inv[i]![j]!));
  const m = Array.from({ length: s }, (_, j) => B.reduce((sum, b, i) => sum + b * inv[i]![j]!, 0));
  const mHat = Array.from({ length: s }, (_, j) => B_EMBEDDED.reduce((sum, b, i) => sum + b * inv[i]![j]!, 0));
  return { stages: s, gamma: GAMMA, a, c, m, e: m.map((x, j) => x - mHat[j]!), order: 3 };
})();

// The transformed coefficients as plain constants for the inner loop.
const [, [A21], [A31, A32], [A41, A42, A43]] = ROS34PW2.a as [number[], [number], [number, number], [number, number, number]];
const [, [C21], [C31, C32], [C41, C42, C43]] = ROS34PW2.c as [number[], [number], [number, number], [number, number, number]];
const [M1, M2, M3, M4] = ROS34PW2.m as [number, number, number, number];
const [E1, E2, E3, E4] = ROS34PW2.e as [number, number, number, number];

const LINEAR_EPSILON = ISO_LINEAR_REGION_EPSILON;
// Bound once: module bindings of imports can cost a property read per call in some loaders.
const flowInto = signedIsoFlowPreparedInto;
const flowOnly = signedIsoFlowPrepared;

/** Filter the error estimate through W⁻¹ (Shampine's device) so that stiff, well-damped nodes do not dictate the step. */
const FILTER_ERROR = true;

/** Absolute tolerances of piston states: 0.01 mm and 1 mm/s. */
const POSITION_TOLERANCE_M = 1e-5;
const VELOCITY_TOLERANCE_M_PER_S = 1e-3;

/**
 * A partition whose masses all drift by less than this share of their tolerance per
 * second is treated as at rest: what is left to happen stays below the tolerance.
 */
const REST_DRIFT_PER_S = 0.05;

/** Evaluations on the step's interpolant to locate a guard crossing before the step is taken again instead. */
const LOCATE_EVALUATIONS = 4;

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

/** Where a partition writes its trace values at the output times that fall inside its steps. */
export interface OutputRows {
  /** Output interval, s: output k is at k·intervalS. */
  readonly intervalS: number;
  /** The row of output k, or null when it is not pending. */
  row(k: number): Float64Array | null;
}

/** What a trace column of a partition reads from the world. */
export const OutputKind = { Pressure: 0, Position: 1, Velocity: 2, Flow: 3 } as const;
export type OutputKind = (typeof OutputKind)[keyof typeof OutputKind];

/** The guards of one partition: piston end stops, stiction, and its behaviours' conditions. */
export interface GuardSource {
  /**
   * Writes the partition's behaviour guard values into `out` from index `at` on and returns the
   * index after the last; when `owners` is given, appends each guard's owner (behaviour, index).
   */
  behaviourGuards(behaviours: readonly number[], out: number[], at: number, owners: number[] | null): number;
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
  private readonly rLinearPhi: Float64Array;
  // Volume of each free node: fixed part plus chamber terms (piston, area coefficient, offset) in CSR form.
  private readonly nodeBaseVolume: Float64Array;
  private readonly chamberStart: Int32Array;
  /** Polytropic exponent of each free node (1 = isothermal). */
  private readonly nodeExponent: Float64Array;
  private readonly chamberPiston: Int32Array;
  private readonly chamberArea: Float64Array;
  private readonly chamberOffset: Float64Array;
  private readonly chamberStroke: Float64Array;

  private y: Float64Array;
  private f: Float64Array;
  private candidate: Float64Array;
  private fCandidate: Float64Array;
  private readonly stage: Float64Array;
  private readonly fStage: Float64Array;
  private readonly errVec: Float64Array;
  /** Stage vectors of the transformed method. */
  private readonly u1: Float64Array;
  private readonly u2: Float64Array;
  private readonly u3: Float64Array;
  private readonly u4: Float64Array;
  /** Free nodes' global indices, and the absolute mass tolerance per m³ of volume (absTolPa/RT), kg/m³. */
  private readonly freeNodeIndex: Int32Array;
  private readonly absTolMassPerVolume: number;
  /** Absolute mass tolerance of each free node at the start of the step, kg. */
  private readonly massScaleOf: Float64Array;
  private fValid = false;
  /** Local indices of the passages that can carry flow (opening above zero), rebuilt when an opening changes. */
  private readonly active: Int32Array;
  private activeCount = 0;
  private activeStale = true;
  private readonly scratch = { flow: 0, dFlowdPa: 0, dFlowdPb: 0 };
  private readonly lu: SparseLu;
  /** The right-hand side written out for this partition; null keeps the loop form (evaluate). */
  private readonly rightHandSide: RightHandSide | null;
  /** W's assembly written out for this partition; null keeps the loop form (assembleW). */
  private readonly iterationMatrix: IterationMatrix | null;
  /** Where each Jacobian term goes in the LU's value array, flattened per restriction (4), coupling (2), modulator (2) and piston (5). */
  private readonly slots: {
    diag: Int32Array;
    restriction: Int32Array;
    couplingStart: Int32Array;
    couplingSlots: Int32Array;
    couplingPiston: Int32Array;
    couplingEnd: Uint8Array;
    couplingDvdx: Float64Array;
    couplingExponent: Float64Array;
    modulator: Int32Array;
    piston: Int32Array;
    /** ∂V/∂x of each piston's cap-side and rod-side node. */
    pistonDvdx: Float64Array;
  };

  time = 0;
  private h = 1e-5;
  /** The next step follows a discrete change: its size is estimated afresh. */
  private restart = true;
  quiescent = false;
  steps = 0;
  rejected = 0;
  /** Guard values at the committed state, and the local guard owners (behaviour, index) after the piston guards. */
  guardValues: number[] = [];
  guardOwners: number[] = [];
  /** Guards that crossed zero at the end of the last advance. */
  crossed: readonly number[] = NO_CROSSINGS;

  private readonly snapY: Float64Array;
  private snapTime = 0;
  private undoable = false;
  private snapH = 0;
  private snapQuiescent = false;
  private snapGuards: number[] = [];
  private snapOwners: number[] = [];
  /** A spare guard list that a step fills and then swaps with the committed one (no garbage per step). */
  private spareGuards: number[] = [];
  // Trace columns this partition fills between meeting points, and their values at the committed state.
  private outCols = new Int32Array(0);
  private outKind = new Uint8Array(0);
  private outSource = new Int32Array(0);
  private outPrev = new Float64Array(0);
  private outNew = new Float64Array(0);
  private rows: OutputRows | null = null;

  /** Guards must be recomputed before the next advance (something discrete changed). */
  dirty = true;
  /** A boundary pressure that its guards read has just changed. */
  boundaryChanged = false;

  /** `straightLine: false` keeps the loop forms of the right-hand side and the LU (the tests compare the two). */
  constructor(world: World, spec: PartitionSpec, tol: Tolerances, guardSource: GuardSource, { straightLine = true }: { straightLine?: boolean } = {}) {
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
    this.rowFrom = ints(spec.restrictions, (r) => this.localOfNode.get(restrictions[r]!.from)!);
    this.rowTo = ints(spec.restrictions, (r) => this.localOfNode.get(restrictions[r]!.to)!);
    const nodes = world.model.nodes;
    this.rIndex = Int32Array.from(spec.restrictions);
    this.rFromNode = ints(spec.restrictions, (r) => restrictions[r]!.from);
    this.rToNode = ints(spec.restrictions, (r) => restrictions[r]!.to);
    this.rCritical = floats(spec.restrictions, (r) => restrictions[r]!.criticalRatio);
    this.rCracking = floats(spec.restrictions, (r) => (restrictions[r]!.oneWay ? (restrictions[r]!.crackingPa ?? 0) : 0));
    this.rOneWay = flags(spec.restrictions, (r) => restrictions[r]!.oneWay === true);
    this.rModulated = flags(spec.restrictions, (r) => restrictions[r]!.modulator !== undefined);
    this.rFromFree = flags(spec.restrictions, (r) => !nodes[restrictions[r]!.from]!.fixed);
    this.rToFree = flags(spec.restrictions, (r) => !nodes[restrictions[r]!.to]!.fixed);
    this.pIndex = Int32Array.from(spec.pistons);
    this.rLinearPhi = floats(spec.restrictions, (r) => isoLinearRegionPhi(restrictions[r]!.criticalRatio, 0.5, LINEAR_EPSILON));
    this.nodeBaseVolume = floats(spec.freeNodes, (node) => nodes[node]!.volumeM3);
    this.nodeExponent = floats(spec.freeNodes, (node) => nodes[node]!.polytropicExponent ?? 1);
    this.chamberStart = new Int32Array(spec.freeNodes.length + 1);
    const cPiston: number[] = [];
    const cArea: number[] = [];
    const cOffset: number[] = [];
    const cStroke: number[] = [];
    spec.freeNodes.forEach((node, i) => {
      for (const c of nodes[node]!.chambers) {
        const p = world.model.pistons[c.piston]!;
        // cap: dead + A·x; rod: dead + a·(stroke − x) = (dead + a·stroke) − a·x.
        cPiston.push(c.piston);
        cStroke.push(p.strokeM);
        if (c.side === 'cap') {
          cArea.push(p.capArea);
          cOffset.push(p.deadVolumeCapM3);
        } else {
          cArea.push(-p.rodSideArea);
          cOffset.push(p.deadVolumeRodM3 + p.rodSideArea * p.strokeM);
        }
      }
      this.chamberStart[i + 1] = cPiston.length;
    });
    this.chamberPiston = Int32Array.from(cPiston);
    this.chamberArea = Float64Array.from(cArea);
    this.chamberOffset = Float64Array.from(cOffset);
    this.chamberStroke = Float64Array.from(cStroke);
    this.y = new Float64Array(n);
    this.f = new Float64Array(n);
    this.candidate = new Float64Array(n);
    this.fCandidate = new Float64Array(n);
    this.stage = new Float64Array(n);
    this.fStage = new Float64Array(n);
    this.errVec = new Float64Array(n);
    this.active = new Int32Array(spec.restrictions.length);
    this.u1 = new Float64Array(n);
    this.u2 = new Float64Array(n);
    this.u3 = new Float64Array(n);
    this.u4 = new Float64Array(n);
    this.freeNodeIndex = Int32Array.from(spec.freeNodes);
    this.absTolMassPerVolume = tol.absTolPa / world.rt;
    this.massScaleOf = new Float64Array(this.nMass);
    this.snapY = new Float64Array(n);
    // Every free node starts at the pressure the world gives it (ambient), as an isothermal mass.
    spec.freeNodes.forEach((node, i) => (this.y[i] = (world.pressure[node]! * this.freeNodeVolume(i)) / world.rt));
    spec.pistons.forEach((k, j) => (this.y[this.xIndex[j]!] = world.position[k]!));
    this.quiescent = n === 0;
    const built = this.buildPattern(!straightLine);
    this.lu = built.lu;
    this.slots = built.slots;
    this.rightHandSide = straightLine ? straightLineRightHandSide(this.shape()) : null;
    this.iterationMatrix = straightLine ? straightLineIterationMatrix(this.matrixShape()) : null;
  }

  /** Mass in the partition's nodes plus what its boundaries have received, kg (constant up to round-off). */
  airBudget(): number {
    let sum = 0;
    for (let i = 0; i < this.nMass + this.spec.fixedNodes.length; i += 1) sum += this.y[i]!;
    return sum;
  }

  /**
   * Re-evaluates the committed state after a discrete change; wakes a quiescent partition.
   * A changed opening makes the flows jump: the next step starts small (`restart`). A piston
   * stopping or starting leaves the pressures' rates continuous, so the step size stays.
   */
  wake(restart = true): void {
    this.activeStale = true;
    this.quiescent = false;
    this.fValid = false;
    this.dirty = true;
    if (restart) this.restart = true;
  }

  refresh(): void {
    this.writePositions(this.y);
    this.evaluate(this.y, this.f, true);
    this.fValid = true;
    this.readOutputs(this.outPrev);
  }

  /**
   * The trace columns this partition owns (port pressures of its free nodes, its pistons,
   * its passages' flows): between meeting points it writes them into the pending rows,
   * interpolated linearly between the accepted steps around each output time.
   */
  setOutputs(columns: readonly number[], kinds: readonly OutputKind[], sources: readonly number[], rows: OutputRows): void {
    this.outCols = Int32Array.from(columns);
    this.outKind = Uint8Array.from(kinds);
    this.outSource = Int32Array.from(sources);
    this.outPrev = new Float64Array(columns.length);
    this.outNew = new Float64Array(columns.length);
    this.rows = rows;
    this.readOutputs(this.outPrev);
  }

  private readOutputs(into: Float64Array): void {
    const w = this.w;
    const kind = this.outKind;
    const source = this.outSource;
    for (let i = 0; i < into.length; i += 1) {
      const s = source[i]!;
      switch (kind[i]) {
        case OutputKind.Pressure:
          into[i] = w.pressure[s]!;
          break;
        case OutputKind.Position:
          into[i] = w.position[s]!;
          break;
        case OutputKind.Velocity:
          into[i] = w.velocity[s]!;
          break;
        default:
          into[i] = w.flow[s]!;
      }
    }
  }

  /** Writes the outputs at the output times in (t0, t1]: between outPrev at t0 and outNew at t1 (or outPrev throughout). */
  private writeRows(t0: number, t1: number, interpolate: boolean): void {
    const rows = this.rows;
    if (!rows || this.outCols.length === 0 || !(t1 > t0)) return;
    const dt = rows.intervalS;
    let k = Math.floor(t0 / dt);
    while (k * dt <= t0 + 1e-12) k += 1;
    const cols = this.outCols;
    const prev = this.outPrev;
    const next = this.outNew;
    for (; k * dt <= t1 + 1e-12; k += 1) {
      const row = rows.row(k);
      if (!row) continue;
      if (!interpolate) {
        for (let i = 0; i < cols.length; i += 1) row[cols[i]!] = prev[i]!;
        continue;
      }
      const theta = Math.min(1, Math.max(0, (k * dt - t0) / (t1 - t0)));
      for (let i = 0; i < cols.length; i += 1) row[cols[i]!] = prev[i]! + theta * (next[i]! - prev[i]!);
    }
  }

  /** Writes the committed outputs into pending row k: its time is now, and a discrete change may just have moved them. */
  writeRow(k: number): void {
    const row = this.rows?.row(k);
    if (!row) return;
    this.ensureFresh();
    const cols = this.outCols;
    for (let i = 0; i < cols.length; i += 1) row[cols[i]!] = this.outPrev[i]!;
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
    this.wake(false);
  }

  /** Remembers the committed state, to undo the next step. */
  snapshot(): void {
    this.undoable = true;
    this.snapTime = this.time;
    this.snapQuiescent = this.quiescent;
    if (this.quiescent) return;
    this.snapY.set(this.y);
    this.snapH = this.h;
    this.snapGuards = this.guardValues;
    this.snapOwners = this.guardOwners;
  }

  restore(): void {
    this.undoable = false;
    this.time = this.snapTime;
    this.crossed = NO_CROSSINGS;
    if (this.snapQuiescent) return;
    this.y.set(this.snapY);
    this.h = this.snapH;
    this.quiescent = false;
    // The undone step's list becomes the spare; the snapshot's is committed again.
    this.spareGuards = this.guardValues;
    this.guardValues = this.snapGuards;
    this.guardOwners = this.snapOwners;
    this.fValid = false;
  }

  /** The earliest time the partition can still go back to: the start of a step it can undo. */
  get undoableFrom(): number {
    return this.undoable ? this.snapTime : this.time;
  }

  /**
   * Time up to which the rows written stay as they are whatever happens next. A step that can be
   * undone may be taken again differently, except a jump at rest: it writes the same constant rows
   * up to wherever it is taken to.
   */
  get settledUntil(): number {
    return this.undoable && !this.snapQuiescent ? this.snapTime : this.time;
  }

  /** The last step can still be undone (once). */
  canUndo(): boolean {
    return this.undoable;
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
   * Takes one accepted step towards `until` (a quiescent partition jumps there); it may stop
   * short at a guard crossing, then `crossed` lists the guards. `snapshot()` before it and
   * `restore()` after it undo the step.
   */
  advanceStep(until: number, restUntil = until): void {
    this.crossed = NO_CROSSINGS;
    if (this.quiescent) {
      this.writeRows(this.time, restUntil, false);
      this.time = restUntil;
      return;
    }
    if (this.step(until, restUntil) === 'continue' && this.time >= until - 1e-12) this.time = until;
  }

  /** One accepted step: it may end on a guard crossing, or find the partition at rest (then it jumps to `stop`). */
  private step(stop: number, restStop: number): 'continue' | 'crossed' | 'quiescent' {
    if (this.restart) {
      this.h = Math.min(this.h, this.restartStep());
      this.restart = false;
    }
    const wanted = Math.min(this.h, this.tol.maxStepS);
    let h = Math.min(wanted, stop - this.time);
    let shortened = false;
    /** A step size that passed the error test before being cut short to locate a crossing. */
    let located = 0;
    // A piston that would run into an end stop within the step meets the kink of its chamber
    // volumes there, which costs rejected steps: end the step just past the stop instead.
    const reach = this.endStopReach();
    if (reach < h) {
      located = wanted;
      h = reach + 0.9 * EVENT_TOLERANCE_S;
      shortened = true;
    }
    for (;;) {
      let landsOnStop = h >= stop - this.time - 1e-15;
      const err = this.rosenbrock(h);
      if (err < 0 || err > 1) {
        this.rejected += 1;
        this.fValid = false;
        h *= err >= 0 ? Math.max(0.2, 0.9 * Math.pow(err, -1 / 3)) : 0.25;
        shortened = true;
        if (h < 1e-12) throw new Error('step size underflow: the circuit could not be integrated');
        continue;
      }
      // The owners stay as they are: only a discrete change (computeGuards) changes what guards there are.
      const after = this.spareGuards;
      this.collectGuards(after, null);
      let { crossed, theta } = this.crossings(after);
      if (crossed && (1 - theta) * h > EVENT_TOLERANCE_S && h > EVENT_TOLERANCE_S) {
        // End the step just past the crossing on the interpolant when its guards agree, rather
        // than taking the step again up to there.
        const cut = this.locateOnInterpolant(h, after);
        if (cut > 0) {
          crossed = this.crossings(after).crossed;
          // Located: the step ends on the crossing, nothing is left to cut.
          theta = 1;
          located = Math.max(located, h);
          h = cut;
          landsOnStop = h >= stop - this.time - 1e-15;
          shortened = true;
        }
      }
      if (crossed && (1 - theta) * h > EVENT_TOLERANCE_S && h > EVENT_TOLERANCE_S) {
        this.fValid = false;
        this.writePositions(this.y);
        located = Math.max(located, h);
        h = Math.max(theta * h + EVENT_TOLERANCE_S / 2, EVENT_TOLERANCE_S / 2);
        shortened = true;
        continue;
      }
      this.steps += 1;
      const t0 = this.time;
      this.time = landsOnStop ? stop : this.time + h;
      if (this.outCols.length) {
        this.readOutputs(this.outNew);
        this.writeRows(t0, this.time, true);
        const prev = this.outPrev;
        this.outPrev = this.outNew;
        this.outNew = prev;
      }
      const y = this.y;
      this.y = this.candidate;
      this.candidate = y;
      const f = this.f;
      this.f = this.fCandidate;
      this.fCandidate = f;
      this.fValid = true;
      this.spareGuards = this.guardValues;
      this.guardValues = after;
      const grow = err > 0 ? Math.min(4, Math.max(0.2, 0.9 * Math.pow(err, -1 / 3))) : 4;
      // A step cut short only to land on a meeting point says nothing against the step size
      // the controller wanted: keep that for the next step.
      // Nor does a step cut short to land on a crossing: the size that passed the error test stays.
      this.h = Math.max(landsOnStop && !shortened && grow >= 1 ? Math.max(h * grow, wanted) : Math.max(h * grow, located), 1e-9);
      if (crossed) {
        this.crossed = crossed;
        return 'crossed';
      }
      this.quiescent = this.isQuiescent();
      if (!this.quiescent) return 'continue';
      // Frozen from here on: the little flow left moves no air in the model, so none is reported.
      for (let j = 0; j < this.rIndex.length; j += 1) this.w.flow[this.rIndex[j]!] = 0;
      this.readOutputs(this.outPrev);
      // The step itself may have gone past where a jump at rest is to end.
      const end = Math.max(restStop, this.time);
      this.writeRows(this.time, end, false);
      this.time = end;
      return 'quiescent';
    }
  }

  /** The guards that changed sign between the committed values and `after`, and the earliest linear-interpolated crossing (fraction of the step). */
  private crossings(after: readonly number[]): { crossed: number[] | null; theta: number } {
    let theta = 1;
    let crossed: number[] | null = null;
    const before = this.guardValues;
    for (let i = 0; i < after.length; i += 1) {
      const g0 = before[i]!;
      const g1 = after[i]!;
      if ((g0 < 0 && g1 >= 0) || (g0 > 0 && g1 <= 0)) {
        (crossed ??= []).push(i);
        theta = Math.min(theta, g0 / (g0 - g1));
      }
    }
    return { crossed, theta };
  }

  /**
   * Finds where the guards first cross within a step of size h that passed the error test, on the
   * cubic Hermite interpolant through both ends and their rates (by false position, a few
   * evaluations at most), and leaves the candidate, the world and `after` at a state just past
   * it; returns that step size, or 0 when it is not found close enough (the caller then takes
   * the step again up to the crossing). The interpolant's error is of order h⁴, the order of the
   * method's own local error, and it keeps the air budget: over the masses and the boundaries'
   * accounts the two ends' weights sum to one and each rate vector sums to zero.
   */
  private locateOnInterpolant(h: number, after: number[]): number {
    const n = this.nState;
    const y0 = this.y;
    const f0 = this.f;
    // The end of the step and its rates move to the stage vectors, free until the next attempt.
    const y1 = this.stage;
    const f1 = this.fStage;
    y1.set(this.candidate);
    f1.set(this.fCandidate);
    let lo = 0;
    let hi = 1;
    let gLo = this.guardValues.slice();
    let gHi = after.slice();
    for (let evaluation = 0; evaluation < LOCATE_EVALUATIONS; evaluation += 1) {
      let root = hi;
      for (let i = 0; i < gHi.length; i += 1) {
        const a = gLo[i]!;
        const b = gHi[i]!;
        if ((a < 0 && b >= 0) || (a > 0 && b <= 0)) root = Math.min(root, lo + ((hi - lo) * a) / (a - b));
      }
      const s = Math.min(root + (0.5 * EVENT_TOLERANCE_S) / h, hi);
      const s2 = s * s;
      const s3 = s2 * s;
      const w10 = (s3 - 2 * s2 + s) * h;
      const w01 = -2 * s3 + 3 * s2;
      const w11 = (s3 - s2) * h;
      const y = this.candidate;
      // y0 + w01·(y1 − y0) rather than (1 − w01)·y0 + w01·y1: a state that does not move (a piston
      // resting on its stop) keeps its value to the last bit.
      for (let i = 0; i < n; i += 1) y[i] = y0[i]! + w01 * (y1[i]! - y0[i]!) + w10 * f0[i]! + w11 * f1[i]!;
      this.writePositions(y);
      if (!this.evaluate(y, this.fCandidate, true)) return 0;
      this.collectGuards(after, null);
      const { crossed, theta } = this.crossings(after);
      const cut = s * h;
      if (crossed && !((1 - theta) * cut > EVENT_TOLERANCE_S && cut > EVENT_TOLERANCE_S)) return cut;
      let crossedHere = false;
      for (let i = 0; i < after.length && !crossedHere; i += 1) {
        const a = gLo[i]!;
        const b = after[i]!;
        crossedHere = (a < 0 && b >= 0) || (a > 0 && b <= 0);
      }
      if (crossedHere) {
        hi = s;
        gHi = after.slice();
      } else {
        lo = s;
        gLo = after.slice();
      }
    }
    return 0;
  }

  /**
   * First step after a discrete change, by the usual starting-step heuristic (Hairer, Nørsett &
   * Wanner, Solving ODEs I, §II.4), in tolerance units: h0, a hundredth of the time in which the
   * state would change by its own size at the present rates; then an explicit Euler probe of
   * size h0 measures how fast the rates change (d2), and the step is the one whose error, of
   * order h³ for the embedded estimate, would be a hundredth of the tolerance, at most 100·h0.
   * Never below RESTART_STEP_S; the error control takes it from there.
   */
  private restartStep(): number {
    if (!this.fValid) this.refresh();
    const firstPiston = this.nMass + this.spec.fixedNodes.length;
    const scaleOf = (i: number) => {
      const magnitude = Math.abs(this.y[i]!);
      return i < this.nMass ? this.massScale(i, magnitude) : ((i - firstPiston) % 2 === 0 ? POSITION_TOLERANCE_M : VELOCITY_TOLERANCE_M_PER_S) + this.tol.relTol * magnitude;
    };
    let d0 = 0;
    let d1 = 0;
    for (let i = 0; i < this.nState; i += 1) {
      if (i >= this.nMass && i < firstPiston) continue;
      const scale = scaleOf(i);
      d0 = Math.max(d0, Math.abs(this.y[i]!) / scale);
      d1 = Math.max(d1, Math.abs(this.f[i]!) / scale);
    }
    if (!(d1 > 0)) return this.tol.maxStepS;
    const h0 = (0.01 * Math.max(d0, 1)) / d1;
    const probe = this.stage;
    const rates = this.fStage;
    for (let i = 0; i < this.nState; i += 1) probe[i] = this.y[i]! + h0 * this.f[i]!;
    this.writePositions(probe);
    const physical = this.evaluate(probe, rates, false);
    // The world now describes the probe.
    this.fValid = false;
    if (!physical) return Math.max(RESTART_STEP_S, h0);
    let d2 = 0;
    for (let i = 0; i < this.nState; i += 1) {
      if (i >= this.nMass && i < firstPiston) continue;
      d2 = Math.max(d2, Math.abs(rates[i]! - this.f[i]!) / scaleOf(i) / h0);
    }
    const h1 = Math.pow(0.01 / Math.max(d1, d2), 1 / 3);
    return Math.max(RESTART_STEP_S, Math.min(100 * h0, h1));
  }

  /** Time in which a free piston moving towards an end stop reaches it at its present speed, s (Infinity: none does). */
  private endStopReach(): number {
    let reach = Infinity;
    const y = this.y;
    const pistons = this.w.model.pistons;
    for (let j = 0; j < this.pIndex.length; j += 1) {
      const k = this.pIndex[j]!;
      if (this.w.mode[k] !== 'free') continue;
      const x = y[this.xIndex[j]!]!;
      const v = y[this.vIndex[j]!]!;
      if (v > 0) reach = Math.min(reach, (pistons[k]!.strokeM - x) / v);
      else if (v < 0) reach = Math.min(reach, x / -v);
    }
    return reach;
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
    return this.absTolMassPerVolume * this.w.volume[this.freeNodeIndex[i]!]! + this.tol.relTol * magnitude;
  }

  /**
   * One ROS34PW2 step of size h from the committed state into `candidate` (and the world's
   * arrays); returns the weighted RMS error estimate, or -1 when a stage left the physical range.
   */
  private rosenbrock(h: number): number {
    const n = this.nState;
    const y0 = this.y;
    if (!this.fValid) this.refresh();
    this.assembleW(h);
    this.lu.factor();
    const gh = GAMMA * h;
    const massScaleOf = this.massScaleOf;
    const volume = this.w.volume;
    const massPerVolume = this.absTolMassPerVolume;
    for (let i = 0; i < this.nMass; i += 1) massScaleOf[i] = massPerVolume * volume[this.freeNodeIndex[i]!]!;
    const lu = this.lu;
    const u1 = this.u1;
    const u2 = this.u2;
    const u3 = this.u3;
    const u4 = this.u4;
    const yStage = this.stage;
    const fStage = this.fStage;
    const f0 = this.f;
    for (let i = 0; i < n; i += 1) u1[i] = gh * f0[i]!;
    lu.solve(u1);
    for (let i = 0; i < n; i += 1) yStage[i] = y0[i]! + A21 * u1[i]!;
    this.writePositions(yStage);
    if (!this.evaluate(yStage, fStage, false)) return -1;
    for (let i = 0; i < n; i += 1) u2[i] = gh * fStage[i]! + C21 * u1[i]!;
    lu.solve(u2);
    for (let i = 0; i < n; i += 1) yStage[i] = y0[i]! + A31 * u1[i]! + A32 * u2[i]!;
    this.writePositions(yStage);
    if (!this.evaluate(yStage, fStage, false)) return -1;
    for (let i = 0; i < n; i += 1) u3[i] = gh * fStage[i]! + C31 * u1[i]! + C32 * u2[i]!;
    lu.solve(u3);
    for (let i = 0; i < n; i += 1) yStage[i] = y0[i]! + A41 * u1[i]! + A42 * u2[i]! + A43 * u3[i]!;
    this.writePositions(yStage);
    if (!this.evaluate(yStage, fStage, false)) return -1;
    for (let i = 0; i < n; i += 1) u4[i] = gh * fStage[i]! + C41 * u1[i]! + C42 * u2[i]! + C43 * u3[i]!;
    lu.solve(u4);
    const yNew = this.candidate;
    const err = this.errVec;
    for (let i = 0; i < n; i += 1) {
      yNew[i] = y0[i]! + M1 * u1[i]! + M2 * u2[i]! + M3 * u3[i]! + M4 * u4[i]!;
      err[i] = E1 * u1[i]! + E2 * u2[i]! + E3 * u3[i]! + E4 * u4[i]!;
    }
    if (FILTER_ERROR) lu.solve(err);
    let errSq = 0;
    let counted = 0;
    const firstPiston = this.nMass + this.spec.fixedNodes.length;
    for (let i = 0; i < n; i += 1) {
      const magnitude = Math.max(Math.abs(y0[i]!), Math.abs(yNew[i]!));
      let scale: number;
      if (i < this.nMass) scale = this.massScaleOf[i]! + this.tol.relTol * magnitude;
      else if (i < firstPiston) continue;
      else scale = ((i - firstPiston) % 2 === 0 ? POSITION_TOLERANCE_M : VELOCITY_TOLERANCE_M_PER_S) + this.tol.relTol * magnitude;
      const ei = err[i]! / scale;
      errSq += ei * ei;
      counted += 1;
    }
    const norm = counted ? Math.sqrt(errSq / counted) : 0;
    // A rejected step needs no right-hand side at its end.
    if (norm > 1) return norm;
    this.writePositions(yNew);
    if (!this.evaluate(yNew, this.fCandidate, true)) return -1;
    return norm;
  }

  private writePositions(y: Float64Array): void {
    const w = this.w;
    for (let j = 0; j < this.pIndex.length; j += 1) {
      const k = this.pIndex[j]!;
      w.position[k] = y[this.xIndex[j]!]!;
      w.velocity[k] = y[this.vIndex[j]!]!;
    }
  }

  /** Volume of free node i (fixed part plus chambers at the world's piston positions), m³. */
  private freeNodeVolume(i: number): number {
    const position = this.w.position;
    let v = this.nodeBaseVolume[i]!;
    for (let c = this.chamberStart[i]!; c < this.chamberStart[i + 1]!; c += 1) {
      const x = position[this.chamberPiston[c]!]!;
      const stroke = this.chamberStroke[c]!;
      v += this.chamberOffset[c]! + this.chamberArea[c]! * (x < 0 ? 0 : x > stroke ? stroke : x);
    }
    return v;
  }

  /**
   * Pressures, flows and (with `derivatives`) their derivatives at y, positions already written;
   * false if a mass went negative. Stage evaluations leave the derivatives out: the next
   * Jacobian is assembled at the state a step ends on, which is evaluated with them.
   */
  private evaluate(y: Float64Array, f: Float64Array, derivatives: boolean): boolean {
    if (this.rightHandSide) {
      if (this.activeStale) this.findActive();
      const rhs = this.rightHandSide;
      return derivatives ? rhs.withDerivatives(y, f, this.w, rhs.indices, rhs.numbers) : rhs.values(y, f, this.w, rhs.indices, rhs.numbers);
    }
    const w = this.w;
    const pressure = w.pressure;
    let physical = true;
    const free = this.freeNodeIndex;
    const volume = w.volume;
    const rt = w.rt;
    const ambient = w.model.ambientPa;
    for (let i = 0; i < free.length; i += 1) {
      const node = free[i]!;
      const v = this.freeNodeVolume(i);
      volume[node] = v;
      const m = y[i]!;
      if (m <= 0) physical = false;
      const mass = m > 1e-15 ? m : 1e-15;
      const isothermal = (mass * rt) / v;
      const n = this.nodeExponent[i]!;
      if (n === 1) {
        pressure[node] = isothermal;
        if (derivatives) w.pressurePerMass[node] = rt / v;
      } else {
        // Polytropic: p = p_amb·(ρ/ρ_amb)^n, and ρ/ρ_amb is the isothermal pressure over p_amb.
        const p = ambient * Math.pow(isothermal / ambient, n);
        pressure[node] = p;
        w.pressurePerMass[node] = (n * p) / mass;
      }
    }
    for (let i = 0; i < f.length; i += 1) f[i] = 0;
    if (this.activeStale) this.findActive();
    const scratch = this.scratch;
    const restrictions = w.model.restrictions;
    const active = this.active;
    for (let n = 0; n < this.activeCount; n += 1) {
      const j = active[n]!;
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
      const a = this.rowFrom[j]!;
      const b = this.rowTo[j]!;
      if (!derivatives) {
        const q = k > 0 && !(this.rOneWay[j] && pa <= pb) ? k * flowOnly(w.gain[r]!, this.rCritical[j]!, 0.5, pa, pb, LINEAR_EPSILON, this.rLinearPhi[j]!) : 0;
        w.flow[r] = q;
        f[a] = f[a]! - q;
        f[b] = f[b]! + q;
        continue;
      }
      let q = 0;
      let da = 0;
      let db = 0;
      let dc = 0;
      if ((k > 0 || dk !== 0) && !(this.rOneWay[j] && pa <= pb)) {
        flowInto(scratch, w.gain[r]!, this.rCritical[j]!, 0.5, pa, pb, LINEAR_EPSILON, this.rLinearPhi[j]!);
        q = k * scratch.flow;
        da = k * scratch.dFlowdPa;
        db = k * scratch.dFlowdPb;
        dc = dk * scratch.flow;
      }
      w.flow[r] = q;
      w.dFlowA[r] = da;
      w.dFlowB[r] = db;
      w.dFlowC[r] = dc;
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

  /** Lists the passages with an opening above zero; the closed ones carry no flow until one changes. */
  private findActive(): void {
    const w = this.w;
    let count = 0;
    for (let j = 0; j < this.rIndex.length; j += 1) {
      const r = this.rIndex[j]!;
      if (w.opening[r]! > 0) this.active[count++] = j;
      else {
        w.flow[r] = 0;
        w.dFlowA[r] = 0;
        w.dFlowB[r] = 0;
        w.dFlowC[r] = 0;
      }
    }
    this.activeCount = count;
    this.activeStale = false;
  }

  /**
   * Writes the guard values into `out` (three per piston, then the behaviours'), by index so that
   * a list of the right length is reused without garbage; with `owners`, appends the owners too.
   */
  private collectGuards(out: number[], owners: number[] | null): void {
    const w = this.w;
    let n = 0;
    for (const k of this.spec.pistons) {
      const p = w.model.pistons[k]!;
      const x = w.position[k]!;
      const drive = w.driveForce(k);
      let g0 = -1;
      let g1 = -1;
      let g2 = -1;
      switch (w.mode[k]) {
        case 'free':
          g0 = x;
          g1 = p.strokeM - x;
          g2 = w.velocity[k]! * w.direction[k]! + 1e-12;
          break;
        case 'end-min':
          g0 = drive - p.breakawayN;
          break;
        case 'end-max':
          g0 = -drive - p.breakawayN;
          break;
        case 'stuck':
          g0 = drive - p.breakawayN;
          g1 = -drive - p.breakawayN;
          break;
      }
      out[n] = g0;
      out[n + 1] = g1;
      out[n + 2] = g2;
      n += 3;
    }
    n = this.guardSource.behaviourGuards(this.spec.behaviours, out, n, owners);
    if (out.length !== n) out.length = n;
  }

  /** Number of piston guards at the front of the guard list (three per piston). */
  get pistonGuardCount(): number {
    return this.spec.pistons.length * 3;
  }

  // ---- Jacobian -------------------------------------------------------------

  /** The right-hand side's parts, for writing it out. */
  private shape(): RightHandSideShape {
    const w = this.w;
    return {
      nState: this.nState,
      rt: w.rt,
      ambientPa: w.model.ambientPa,
      freeNodes: this.spec.freeNodes.map((node, i) => ({
        node,
        row: i,
        baseVolume: this.nodeBaseVolume[i]!,
        exponent: this.nodeExponent[i]!,
        chambers: Array.from({ length: this.chamberStart[i + 1]! - this.chamberStart[i]! }, (_, n) => {
          const c = this.chamberStart[i]! + n;
          return { piston: this.chamberPiston[c]!, area: this.chamberArea[c]!, offset: this.chamberOffset[c]!, stroke: this.chamberStroke[c]! };
        }),
      })),
      restrictions: this.spec.restrictions.map((r, j) => ({
        r,
        from: this.rFromNode[j]!,
        to: this.rToNode[j]!,
        rowFrom: this.rowFrom[j]!,
        rowTo: this.rowTo[j]!,
        critical: this.rCritical[j]!,
        cracking: this.rCracking[j]!,
        oneWay: this.rOneWay[j] === 1,
        modulated: this.rModulated[j] === 1,
        linearPhi: this.rLinearPhi[j]!,
      })),
      pistons: this.spec.pistons.map((k, j) => ({ k, x: this.xIndex[j]!, v: this.vIndex[j]! })),
    };
  }

  /** Where W's terms go and what they read, for writing its assembly out. */
  private matrixShape(): IterationMatrixShape {
    const slots = this.slots;
    const restrictions = this.w.model.restrictions;
    return {
      slotCount: this.lu.values.length,
      diagonal: slots.diag,
      restrictions: this.spec.restrictions.map((r, j) => {
        const couplings = [];
        for (let n = slots.couplingStart[j]!; n < slots.couplingStart[j + 1]!; n += 1) {
          couplings.push({
            piston: slots.couplingPiston[n]!,
            fromEnd: slots.couplingEnd[n] === 0,
            exponent: slots.couplingExponent[n]!,
            dvdx: slots.couplingDvdx[n]!,
            slots: [slots.couplingSlots[2 * n]!, slots.couplingSlots[2 * n + 1]!] as const,
          });
        }
        return {
          r,
          from: this.rFromNode[j]!,
          to: this.rToNode[j]!,
          fromFree: this.rFromFree[j] === 1,
          toFree: this.rToFree[j] === 1,
          slots: [slots.restriction[4 * j]!, slots.restriction[4 * j + 1]!, slots.restriction[4 * j + 2]!, slots.restriction[4 * j + 3]!] as const,
          couplings,
          modulator: restrictions[r]!.modulator ? ([slots.modulator[2 * j]!, slots.modulator[2 * j + 1]!] as const) : null,
        };
      }),
      pistons: this.spec.pistons.map((k, j) => ({
        k,
        slots: [slots.piston[5 * j]!, slots.piston[5 * j + 1]!, slots.piston[5 * j + 2]!, slots.piston[5 * j + 3]!, slots.piston[5 * j + 4]!] as const,
        hasRod: this.w.model.pistons[k]!.rodNode !== null,
        dvdxCap: slots.pistonDvdx[2 * j]!,
        dvdxRod: slots.pistonDvdx[2 * j + 1]!,
      })),
    };
  }

  private buildPattern(loops: boolean): { lu: SparseLu; slots: Partition['slots'] } {
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
    const lu = new SparseLu(this.nState, pairs, { loops });
    const diag = new Int32Array(this.nState);
    for (let i = 0; i < this.nState; i += 1) diag[i] = lu.slot(i, i);
    // Four slots per passage: from-from, from-to, to-from, to-to.
    const restriction = new Int32Array(4 * this.spec.restrictions.length);
    for (let j = 0; j < this.spec.restrictions.length; j += 1) {
      const a = this.rowFrom[j]!;
      const b = this.rowTo[j]!;
      restriction[4 * j] = lu.slot(a, a);
      restriction[4 * j + 1] = lu.slot(a, b);
      restriction[4 * j + 2] = lu.slot(b, a);
      restriction[4 * j + 3] = lu.slot(b, b);
    }
    // Volume couplings: a passage's flow depends on a chamber's pressure, which depends on its piston's position.
    const couplingStart = new Int32Array(this.spec.restrictions.length + 1);
    const couplingSlots: number[] = [];
    const couplingPiston: number[] = [];
    const couplingEnd: number[] = [];
    const couplingDvdx: number[] = [];
    const couplingExponent: number[] = [];
    this.spec.restrictions.forEach((r, j) => {
      const spec = restrictions[r]!;
      [spec.from, spec.to].forEach((end, e) => {
        for (const k of new Set(nodes[end]!.chambers.map((c) => c.piston))) {
          const x = this.xIndex[pistonLocal.get(k)!]!;
          couplingSlots.push(lu.slot(this.rowFrom[j]!, x), lu.slot(this.rowTo[j]!, x));
          couplingPiston.push(k);
          couplingEnd.push(e);
          couplingDvdx.push(this.dvdx(end, k));
          couplingExponent.push(nodes[end]!.polytropicExponent ?? 1);
        }
      });
      couplingStart[j + 1] = couplingPiston.length;
    });
    const modulator = new Int32Array(2 * this.spec.restrictions.length).fill(-1);
    this.spec.restrictions.forEach((r, j) => {
      const control = restrictions[r]!.modulator?.control;
      if (control === undefined) return;
      modulator[2 * j] = lu.slot(this.rowFrom[j]!, local(control));
      modulator[2 * j + 1] = lu.slot(this.rowTo[j]!, local(control));
    });
    const piston = new Int32Array(5 * this.spec.pistons.length);
    const pistonDvdx = new Float64Array(2 * this.spec.pistons.length);
    this.spec.pistons.forEach((k, j) => {
      const p = pistons[k]!;
      const x = this.xIndex[j]!;
      const v = this.vIndex[j]!;
      piston.set([lu.slot(x, v), lu.slot(v, local(p.capNode)), p.rodNode === null ? -1 : lu.slot(v, local(p.rodNode)), lu.slot(v, x), lu.slot(v, v)], 5 * j);
      pistonDvdx[2 * j] = this.dvdx(p.capNode, k);
      pistonDvdx[2 * j + 1] = p.rodNode === null ? 0 : this.dvdx(p.rodNode, k);
    });
    return {
      lu,
      slots: {
        diag,
        restriction,
        couplingStart,
        couplingSlots: Int32Array.from(couplingSlots),
        couplingPiston: Int32Array.from(couplingPiston),
        couplingEnd: Uint8Array.from(couplingEnd),
        couplingDvdx: Float64Array.from(couplingDvdx),
        couplingExponent: Float64Array.from(couplingExponent),
        modulator,
        piston,
        pistonDvdx,
      },
    };
  }

  /** ∂V/∂x of a node through the chambers of piston k (+A on the cap side, −a on the rod side), m². */
  private dvdx(node: number, k: number): number {
    const p = this.w.model.pistons[k]!;
    let dv = 0;
    for (const c of this.w.model.nodes[node]!.chambers) if (c.piston === k) dv += c.side === 'cap' ? p.capArea : -p.rodSideArea;
    return dv;
  }

  /**
   * W = I − γhJ at the committed state (the world's work arrays must describe it). ∂p/∂m of a
   * free node is n·p/m (RT/V when isothermal), 0 on a boundary; ∂p/∂x through a chamber of
   * piston k is −n·p/V·∂V/∂x.
   */
  private assembleW(h: number): void {
    const v = this.lu.values;
    const c = -GAMMA * h;
    if (this.iterationMatrix) {
      const m = this.iterationMatrix;
      m.assemble(v, c, this.w, m.indices, m.numbers);
      return;
    }
    const w = this.w;
    const pressurePerMass = w.pressurePerMass;
    const pressure = w.pressure;
    const volume = w.volume;
    const mode = w.mode;
    const slots = this.slots;
    const rs = slots.restriction;
    for (let i = 0; i < v.length; i += 1) v[i] = 0;
    const diag = slots.diag;
    for (let i = 0; i < diag.length; i += 1) v[diag[i]!] = 1;
    const active = this.active;
    for (let a = 0; a < this.activeCount; a += 1) {
      const j = active[a]!;
      const r = this.rIndex[j]!;
      const from = this.rFromNode[j]!;
      const to = this.rToNode[j]!;
      // dm_from/dt = −q and dm_to/dt = +q.
      const ja = this.rFromFree[j] ? w.dFlowA[r]! * pressurePerMass[from]! : 0;
      const jb = this.rToFree[j] ? w.dFlowB[r]! * pressurePerMass[to]! : 0;
      const at = 4 * j;
      v[rs[at]!] = v[rs[at]!]! - c * ja;
      v[rs[at + 2]!] = v[rs[at + 2]!]! + c * ja;
      v[rs[at + 1]!] = v[rs[at + 1]!]! - c * jb;
      v[rs[at + 3]!] = v[rs[at + 3]!]! + c * jb;
      for (let n = slots.couplingStart[j]!; n < slots.couplingStart[j + 1]!; n += 1) {
        if (mode[slots.couplingPiston[n]!] !== 'free') continue;
        const fromEnd = slots.couplingEnd[n] === 0;
        const node = fromEnd ? from : to;
        const dpdx = ((-slots.couplingExponent[n]! * pressure[node]!) / volume[node]!) * slots.couplingDvdx[n]!;
        const jx = (fromEnd ? w.dFlowA[r]! : w.dFlowB[r]!) * dpdx;
        const s0 = slots.couplingSlots[2 * n]!;
        const s1 = slots.couplingSlots[2 * n + 1]!;
        v[s0] = v[s0]! - c * jx;
        v[s1] = v[s1]! + c * jx;
      }
      if (this.rModulated[j]) {
        const control = this.w.model.restrictions[r]!.modulator!.control;
        const jc = w.dFlowC[r]! * (w.isFixed[control] ? 0 : pressurePerMass[control]!);
        const m0 = slots.modulator[2 * j]!;
        const m1 = slots.modulator[2 * j + 1]!;
        v[m0] = v[m0]! - c * jc;
        v[m1] = v[m1]! + c * jc;
      }
    }
    const pistons = w.model.pistons;
    const ps = slots.piston;
    for (let j = 0; j < this.pIndex.length; j += 1) {
      const k = this.pIndex[j]!;
      if (mode[k] !== 'free') continue;
      const p = pistons[k]!;
      const at = 5 * j;
      const mass = p.movingMassKg;
      const cap = p.capNode;
      const rod = p.rodNode;
      v[ps[at]!] = v[ps[at]!]! + c;
      v[ps[at + 1]!] = v[ps[at + 1]!]! + (c * p.capArea * (w.isFixed[cap] ? 0 : pressurePerMass[cap]!)) / mass;
      if (rod !== null) v[ps[at + 2]!] = v[ps[at + 2]!]! - (c * p.rodSideArea * (w.isFixed[rod] ? 0 : pressurePerMass[rod]!)) / mass;
      const capExponent = this.w.model.nodes[cap]!.polytropicExponent ?? 1;
      let dFdx = (p.capArea * (-capExponent * pressure[cap]!) * slots.pistonDvdx[2 * j]!) / volume[cap]! - p.springRateNPerM;
      if (rod !== null) {
        const rodExponent = this.w.model.nodes[rod]!.polytropicExponent ?? 1;
        dFdx -= (p.rodSideArea * (-rodExponent * pressure[rod]!) * slots.pistonDvdx[2 * j + 1]!) / volume[rod]!;
      }
      v[ps[at + 3]!] = v[ps[at + 3]!]! + (c * dFdx) / mass;
      v[ps[at + 4]!] = v[ps[at + 4]!]! + (c * -p.viscousNsPerM) / mass;
    }
  }
}
