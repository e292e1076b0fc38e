import { ISO_LINEAR_REGION_EPSILON, signedIsoFlowInto } from '../calc/iso6358';
import type { InputCommand, NodeRef, PistonRef, RestrictionRef, RuntimeApi } from '../components/types';
import { MemoryTraceSink, type SignalUnit, type Trace, type TraceSink } from '../trace/trace';
import type { SolverModel } from './model';
import { buildPartitions } from './partitioning';
import { OutputKind, Partition, type GuardSource, type OutputRows } from './partition';
import { TimeQueue } from './time-queue';
import { World } from './world';


/** A timed input: press, release or toggle a manual actuator, or change a setting. */
export interface InputEvent extends InputCommand {
  /** Time, s. */
  t: number;
  /** Component id or tag. */
  component: string;
}

export interface SimulationOptions {
  /** Machine time to simulate, s. */
  untilS: number;
  /** Output interval of the trace, s (default 0.01). */
  intervalS?: number;
  /** Relative tolerance of the step-size control (default 1e-3). */
  relTol?: number;
  /** Absolute pressure tolerance, Pa (default 200, i.e. 0.002 bar). */
  absTolPa?: number;
  /** Longest step, s (default 0.02; outputs between steps are interpolated, so it need not follow the output interval). */
  maxStepS?: number;
  /** Record the mass flow through every passage (default true). */
  recordFlows?: boolean;
  /**
   * Write each partition's right-hand side and LU out as straight-line code (default true); false
   * keeps the loop forms, which give the same trace bit for bit, slower. The loop forms are also
   * what a platform that forbids compiling code at run time gets.
   */
  straightLine?: boolean;
}

/**
 * Output rows kept pending. Partitions step past output times and fill their
 * columns by interpolation; a row goes to the sink once every partition has
 * passed it. Partitions land on every epoch boundary (EPOCH_ROWS output
 * intervals apart) and are never more than one epoch ahead of the oldest
 * pending row, so two epochs' rows are enough.
 */
const EPOCH_ROWS = 64;
const PENDING_ROWS = 2 * EPOCH_ROWS;

/** Times closer than this are the same instant, s. */
const SAME_TIME_S = 1e-12;

interface Timer {
  t: number;
  seq: number;
  behaviour: number;
  tag: string;
  /** An input another behaviour sent (instead of a call of onTimer). */
  command?: InputCommand;
}

/**
 * Runs a compiled model from t = 0 to `untilS` with the given inputs and returns
 * the trace (or streams it into `sink`). Deterministic: the same model, inputs
 * and options give the same trace bit for bit (no randomness, no clock reads,
 * fixed iteration order). A model runs once: compile the document again for another run.
 */
export function simulate(model: SolverModel, inputs: readonly InputEvent[], options: SimulationOptions, sink?: TraceSink): Trace {
  const run = begin(model, options, sink, inputs);
  run.advance(options.untilS);
  return run.finish();
}

/** A run advanced piece by piece, taking inputs as it goes: the editor's live run. */
export interface SteppedSimulation {
  readonly intervalS: number;
  /** Machine time up to which output rows have gone to the sink. */
  readonly sentUpTo: number;
  /** The run has reached `untilS`. */
  readonly finished: boolean;
  /** Runs on until every part has reached this machine time, sending the rows that are settled. */
  advance(toS: number): void;
  /**
   * Runs on until every row up to this machine time has gone to the sink (or the run has ended).
   * A part that has just come to rest keeps its last step open, so its rows can lag the time
   * reached: the run goes on an output interval at a time until they are out.
   */
  advanceUntilSent(toS: number): void;
  /** The earliest machine time an input given now can act at. */
  earliestInputTime(): number;
  /** Takes an input at its time, or at the earliest time still open if that is later; returns it as applied. */
  addInput(input: InputEvent): InputEvent;
  /** The step statistics so far, in an otherwise empty trace: the rows and events went to the sink. */
  finish(): Trace;
}

/**
 * Starts a run that is advanced by the caller and can take inputs while it goes. Given the
 * inputs as they were applied, `simulate` gives the same rows bit for bit: an input arriving
 * late acts exactly as if it had been known from the start.
 */
export function startSimulation(model: SolverModel, options: SimulationOptions, sink: TraceSink, inputs: readonly InputEvent[] = []): SteppedSimulation {
  return begin(model, options, sink, inputs);
}

function begin(model: SolverModel, options: SimulationOptions, sink: TraceSink | undefined, inputs: readonly InputEvent[]): Run {
  // Components keep their state (valve positions, relay contacts) in the model they were built into.
  if (ran.has(model)) throw new Error('a compiled model runs once: compile the document again for another run');
  ran.add(model);
  const run = new Run(model, options, sink);
  run.begin([...inputs].sort((a, b) => a.t - b.t));
  return run;
}

/** First index at or after `from` whose input comes after time t (inputs at equal times keep their order). */
function upperBound(inputs: readonly InputEvent[], t: number, from: number): number {
  let i = from;
  while (i < inputs.length && inputs[i]!.t <= t) i += 1;
  return i;
}

const ran = new WeakSet<SolverModel>();

function includes(list: ArrayLike<number>, value: number): boolean {
  for (let i = 0; i < list.length; i += 1) if (list[i] === value) return true;
  return false;
}

/**
 * Partitions keep their own time. Discrete happenings — inputs, timers, guard
 * crossings — are handled one instant at a time, in time order, once every
 * partition has reached that instant; but only the partitions the acting
 * behaviours may read or change (their touch set) have to land on it exactly.
 * The others may already be a step beyond, so a busy circuit does not cut every
 * moving partition's step at every happening elsewhere. A partition is never
 * more than one step beyond the earliest pending instant, and can undo that step
 * when a newly found crossing or a new timer turns out to touch it.
 */
class Run implements GuardSource, OutputRows, SteppedSimulation {
  private readonly m: SolverModel;
  private readonly w: World;
  private readonly partitions: Partition[];
  private readonly partitionOfRestriction: Int32Array;
  private readonly partitionOfPiston: Int32Array;
  private readonly partitionOfFreeNode: Int32Array;
  private readonly partitionsOfFixedNode = new Map<number, number[]>();
  /** The partition whose guards each behaviour's guards belong to (-1: none). */
  private readonly partitionOfBehaviour: Int32Array;
  /** Partitions holding each behaviour's passages and pistons. */
  private readonly partitionsOwnedBy: number[][];
  /** Partitions holding each behaviour's pressure-modulated passages: woken whenever it acts, since it may have moved their set point. */
  private readonly modulatedBy: number[][];
  /** Partitions each behaviour may read or change when it acts: all of them for one that holds a boundary pressure. */
  private readonly touchOf: Int32Array[];
  private readonly untilS: number;
  private readonly sink: TraceSink;
  private readonly memory: MemoryTraceSink | null;
  private readonly recordFlows: boolean;
  private readonly api: RuntimeApi;
  private readonly timers: Timer[] = [];
  private timerSeq = 0;
  /** The instant being handled (or last handled). */
  private time = 0;
  private currentBehaviour = -1;
  private readonly initialBudget: number;
  private readonly queue: TimeQueue;
  /** Latest time each partition may step to: the earliest pending happening that touches it (the end of the pending rows aside). */
  private readonly cap: Float64Array;
  /** Partitions whose cap may have changed since it was last worked out. */
  private readonly capDirty: Uint8Array;
  private dirty: number[] = [];
  /** Partitions standing on a guard crossing not yet handled, and what each crossing touches. */
  private crossing: number[] = [];
  private readonly crossTouch: Array<readonly number[]>;
  /** Times of the inputs that touch each partition, and the next one not yet handled. */
  private readonly inputTimes: number[][];
  private readonly inputNext: Int32Array;
  private inputs: InputEvent[] = [];
  private inputCursor = 0;
  /** Partitions standing on the instant being handled: only they may be read or changed. */
  private readonly synced: Uint8Array;
  private syncedList: number[] = [];
  private handling = false;
  finished = false;
  private sample = new Float64Array(0);
  readonly intervalS: number;
  /** Ring of pending output rows; row k lives at k mod PENDING_ROWS while firstPending ≤ k < firstPending + PENDING_ROWS. */
  private readonly pending: Float64Array[] = [];
  private firstPending = 1;
  /** Columns that no partition fills: boundary pressures, passages between boundaries, behaviour signals. */
  private constantColumns = new Int32Array(0);
  /** (column, node) pairs of port pressures held by boundaries, and (column, passage) pairs of passages between boundaries. */
  private boundaryPortColumns = new Int32Array(0);
  private boundaryFlowColumns = new Int32Array(0);
  /** How many signals each behaviour has, and where they start in a trace row. */
  private readonly signalCount: number[];
  private readonly signalColumn: Int32Array;
  /** Where the wires' live flags start in a trace row. */
  private wireColumn = 0;
  /**
   * The columns no partition fills, kept up to date: behaviour signals as of each behaviour's
   * last action (or its contacts' last change), boundary pressures and flows when rows are sent.
   */
  private constants = new Float64Array(0);

  constructor(model: SolverModel, options: SimulationOptions, sink?: TraceSink) {
    this.m = model;
    this.w = new World(model);
    this.intervalS = options.intervalS ?? 0.01;
    this.untilS = options.untilS;
    this.recordFlows = options.recordFlows ?? true;
    this.memory = sink ? null : new MemoryTraceSink();
    this.sink = sink ?? this.memory!;
    this.api = this.makeApi();
    const tol = { relTol: options.relTol ?? 1e-3, absTolPa: options.absTolPa ?? 200, maxStepS: options.maxStepS ?? 0.02 };
    const specs = buildPartitions(model, this.api);
    this.partitions = specs.map((spec) => new Partition(this.w, spec, tol, this, { straightLine: options.straightLine }));
    this.partitionOfRestriction = new Int32Array(model.restrictions.length).fill(-1);
    this.partitionOfPiston = new Int32Array(model.pistons.length).fill(-1);
    this.partitionOfFreeNode = new Int32Array(model.nodes.length).fill(-1);
    this.partitionOfBehaviour = new Int32Array(model.behaviours.length).fill(-1);
    specs.forEach((spec, i) => {
      for (const b of spec.behaviours) this.partitionOfBehaviour[b] = i;
      for (const r of spec.restrictions) this.partitionOfRestriction[r] = i;
      for (const k of spec.pistons) this.partitionOfPiston[k] = i;
      for (const node of spec.freeNodes) this.partitionOfFreeNode[node] = i;
      for (const node of new Set([...spec.fixedNodes, ...spec.watchedBoundaries])) {
        if (!this.partitionsOfFixedNode.has(node)) this.partitionsOfFixedNode.set(node, []);
        this.partitionsOfFixedNode.get(node)!.push(i);
      }
    });
    const owned = new Map<string, Set<number>>();
    const modulated = new Map<string, Set<number>>();
    const note = (map: Map<string, Set<number>>, owner: string, partition: number) => {
      if (partition < 0) return;
      if (!map.has(owner)) map.set(owner, new Set());
      map.get(owner)!.add(partition);
    };
    model.restrictions.forEach((r, index) => {
      note(owned, r.owner, this.partitionOfRestriction[index]!);
      if (r.modulator) note(modulated, r.owner, this.partitionOfRestriction[index]!);
    });
    model.pistons.forEach((p, k) => note(owned, p.owner, this.partitionOfPiston[k]!));
    const sorted = (set: Set<number> | undefined) => [...(set ?? [])].sort((a, b) => a - b);
    this.partitionsOwnedBy = model.behaviours.map((entry) => sorted(owned.get(entry.componentId)));
    this.modulatedBy = model.behaviours.map((entry) => sorted(modulated.get(entry.componentId)));
    const holders = new Set(model.nodes.flatMap((n) => (n.fixed && n.holder ? [n.holder] : [])));
    const every = Int32Array.from(this.partitions.keys());
    this.touchOf = model.behaviours.map((entry, b) => {
      // A held boundary feeds partitions whose own behaviours then act at once: the whole circuit meets.
      if (holders.has(entry.componentId)) return every;
      const touched = new Set(this.partitionsOwnedBy[b]);
      if (this.partitionOfBehaviour[b]! >= 0) touched.add(this.partitionOfBehaviour[b]!);
      return Int32Array.from([...touched].sort((x, y) => x - y));
    });
    this.queue = new TimeQueue(this.partitions);
    this.cap = new Float64Array(this.partitions.length);
    this.capDirty = new Uint8Array(this.partitions.length);
    this.crossTouch = this.partitions.map(() => []);
    this.inputTimes = this.partitions.map(() => []);
    this.inputNext = new Int32Array(this.partitions.length);
    this.synced = new Uint8Array(this.partitions.length);
    this.signalCount = model.behaviours.map((b) => Object.keys(b.behaviour.signals?.() ?? {}).length);
    this.signalColumn = new Int32Array(model.behaviours.length);
    this.initialBudget = this.airBudget();
  }

  row(k: number): Float64Array | null {
    return k >= this.firstPending && k < this.firstPending + PENDING_ROWS ? this.pending[k % PENDING_ROWS]! : null;
  }

  /** Tells each partition which trace columns it fills between meeting points. */
  private assignColumns(width: number): void {
    const columns = this.partitions.map(() => ({ cols: [] as number[], kinds: [] as OutputKind[], sources: [] as number[] }));
    const owned = new Uint8Array(width);
    const claim = (partition: number, col: number, kind: OutputKind, source: number) => {
      if (partition < 0) return;
      columns[partition]!.cols.push(col);
      columns[partition]!.kinds.push(kind);
      columns[partition]!.sources.push(source);
      owned[col] = 1;
    };
    let col = 0;
    const boundaryPorts: number[] = [];
    const boundaryFlows: number[] = [];
    for (const p of this.m.portNodes) {
      if (this.partitionOfFreeNode[p.node]! < 0) boundaryPorts.push(col, p.node);
      claim(this.partitionOfFreeNode[p.node]!, col++, OutputKind.Pressure, p.node);
    }
    this.m.pistons.forEach((_, k) => {
      claim(this.partitionOfPiston[k]!, col++, OutputKind.Position, k);
      claim(this.partitionOfPiston[k]!, col++, OutputKind.Velocity, k);
    });
    if (this.recordFlows) {
      for (let r = 0; r < this.m.restrictions.length; r += 1) {
        if (this.partitionOfRestriction[r]! < 0) boundaryFlows.push(col, r);
        claim(this.partitionOfRestriction[r]!, col++, OutputKind.Flow, r);
      }
    }
    this.boundaryPortColumns = Int32Array.from(boundaryPorts);
    this.boundaryFlowColumns = Int32Array.from(boundaryFlows);
    this.m.behaviours.forEach((_, b) => {
      this.signalColumn[b] = col;
      col += this.signalCount[b]!;
    });
    this.wireColumn = col;
    this.constants = new Float64Array(width);
    this.m.behaviours.forEach((_, b) => this.readSignals(b));
    this.partitions.forEach((p, i) => p.setOutputs(columns[i]!.cols, columns[i]!.kinds, columns[i]!.sources, this));
    const constant: number[] = [];
    for (let c = 0; c < width; c += 1) if (!owned[c]) constant.push(c);
    this.constantColumns = Int32Array.from(constant);
    for (let i = 0; i < PENDING_ROWS; i += 1) this.pending.push(new Float64Array(width));
  }

  /**
   * Sends the pending rows at times up to `reached` (before it, unless `inclusive`) to the
   * sink. Every partition has passed them; the columns no partition fills change only at
   * handled instants, so they are taken as they are now.
   */
  private flushRows(reached: number, inclusive: boolean): void {
    const limit = inclusive ? reached + SAME_TIME_S : reached - SAME_TIME_S;
    const last = this.untilS - SAME_TIME_S;
    if (this.firstPending * this.intervalS >= limit || this.firstPending * this.intervalS >= last) return;
    this.sampleBoundaries();
    const constant = this.constantColumns;
    const values = this.constants;
    while (this.firstPending * this.intervalS < limit && this.firstPending * this.intervalS < last) {
      const k = this.firstPending;
      const row = this.pending[k % PENDING_ROWS]!;
      for (let i = 0; i < constant.length; i += 1) row[constant[i]!] = values[constant[i]!]!;
      this.sink.sample(k * this.intervalS, row);
      this.firstPending += 1;
    }
  }

  /** Sets up the trace and handles t = 0. */
  begin(inputs: InputEvent[]): void {
    const names = this.signalNames();
    this.sink.begin(names);
    const sample = new Float64Array(names.length);
    this.sample = sample;
    this.assignColumns(names.length);
    this.indexInputs(inputs);
    this.touchCaps(Int32Array.from(this.partitions.keys()));
    // t = 0: every partition stands on it.
    this.beginInstant(0);
    this.m.behaviours.forEach((_, i) => this.withBehaviour(i, (b) => b.start?.(this.api)));
    this.settle();
    // Conditions already true at the start count as having just become true.
    for (const p of this.partitions) p.crossed = p.guardValues.flatMap((g, i) => (i >= p.pistonGuardCount && g > 0 ? [i] : []));
    this.fireCrossings();
    this.settle();
    // What the start set going at once (coils energised from the first settle of the control circuit).
    this.fireDueTimers(0);
    this.settle();
    this.endInstant();
    this.record(sample);
  }

  /**
   * Runs on until every partition has reached `limit` (or the end of the run), handling every
   * instant up to it. Stopping and going on again changes nothing in the result: the loop is the
   * same one, only paused.
   */
  advance(limit: number): void {
    const partitions = this.partitions;
    const sample = this.sample;
    while (!this.finished) {
      if (this.dirty.length) this.refreshCaps();
      const next = this.nextInstant();
      const behind = this.queue.top();
      const p = partitions[behind];
      if (p && p.time < next - SAME_TIME_S) {
        if (p.time >= limit - SAME_TIME_S) break;
        p.snapshot();
        const until = Math.min(this.cap[behind]!, this.epochEnd(p.time));
        // A partition at rest would jump to the end of its epoch; stopping it at the limit gives the
        // same (constant) rows and lets them go out now rather than up to an epoch later.
        p.advanceStep(until, Math.min(until, Math.max(limit, p.time)));
        this.queue.update(behind);
        if (p.crossed.length) this.crossingFound(behind);
        continue;
      }
      if (next > limit + SAME_TIME_S) break;
      this.handle(next, sample);
      if (next >= this.untilS - SAME_TIME_S) this.finished = true;
    }
    if (!this.finished) this.flushRows(Math.min(this.nextInstant(), this.settledUntil()), false);
  }

  advanceUntilSent(toS: number): void {
    const target = Math.min(toS, this.untilS);
    const lastRow = Math.floor(target / this.intervalS + 1e-9);
    for (let limit = target; !this.finished && this.firstPending <= lastRow; limit = Math.min(this.untilS, limit + this.intervalS)) this.advance(limit);
  }

  /** The earliest time any partition's rows may still change. */
  private settledUntil(): number {
    let t = Infinity;
    for (const p of this.partitions) t = Math.min(t, p.settledUntil);
    return t;
  }

  /**
   * The earliest time an input given now can act at: not before an instant already handled, a
   * row already sent, or the start of a partition's step that can no longer be undone.
   */
  earliestInputTime(): number {
    let t = Math.max(this.time, this.firstPending * this.intervalS);
    for (const p of this.partitions) t = Math.max(t, p.undoableFrom);
    return t;
  }

  /** Machine time up to which rows have gone to the sink. */
  get sentUpTo(): number {
    return (this.firstPending - 1) * this.intervalS;
  }

  /** Takes an input during the run, at its time or the earliest time still open; returns it as applied. */
  addInput(input: InputEvent): InputEvent {
    const applied = { ...input, t: Math.min(Math.max(input.t, this.earliestInputTime()), this.untilS) };
    const at = upperBound(this.inputs, applied.t, this.inputCursor);
    this.inputs.splice(at, 0, applied);
    const b = this.m.componentIds.get(applied.component);
    if (b === undefined) return applied;
    for (const p of this.touchOf[b]!) {
      const times = this.inputTimes[p]!;
      let i = times.length;
      while (i > 0 && times[i - 1]! > applied.t) i -= 1;
      times.splice(i, 0, applied.t);
    }
    this.touchCaps(this.touchOf[b]!);
    return applied;
  }

  finish(): Trace {
    const partitions = this.partitions;
    const steps = partitions.reduce((s, q) => s + q.steps, 0);
    const rejectedSteps = partitions.reduce((s, q) => s + q.rejected, 0);
    const stats = { steps, rejectedSteps, massBalanceErrorKg: this.airBudget() - this.initialBudget };
    return this.memory ? this.memory.toTrace(this.intervalS, stats) : { formatVersion: 1, intervalS: this.intervalS, time: [], signals: [], events: [], stats };
  }

  /** Sorts the inputs' times by the partitions they touch, so each partition knows how far it may run. */
  private indexInputs(inputs: InputEvent[]): void {
    this.inputs = inputs;
    const lists = this.partitions.map(() => [] as number[]);
    for (const input of inputs) {
      const b = this.m.componentIds.get(input.component);
      if (b === undefined) continue;
      for (const p of this.touchOf[b]!) lists[p]!.push(input.t);
    }
    lists.forEach((list, p) => (this.inputTimes[p] = list));
  }

  /** The earliest instant with something to handle: an input, a timer, a crossing, the end of the pending rows. */
  /**
   * The end of the epoch a partition is in: epochs are EPOCH_ROWS output intervals long, fixed in
   * time. Every partition lands on every epoch boundary whatever the others do, so its steps are
   * its own; and since a partition only steps while it is the one furthest behind, none is ever
   * more than an epoch ahead of the oldest row not yet sent.
   */
  private epochEnd(time: number): number {
    return Math.min((Math.floor(time / (EPOCH_ROWS * this.intervalS) + 1e-9) + 1) * EPOCH_ROWS * this.intervalS, this.untilS);
  }

  private nextInstant(): number {
    // The next epoch boundary is an instant: its rows are sent there.
    let t = Math.min(Math.ceil(this.firstPending / EPOCH_ROWS) * EPOCH_ROWS * this.intervalS, this.untilS);
    if (this.inputCursor < this.inputs.length) t = Math.min(t, this.inputs[this.inputCursor]!.t);
    if (this.timers.length) t = Math.min(t, this.timers[0]!.t);
    for (const i of this.crossing) t = Math.min(t, this.partitions[i]!.time);
    return t;
  }

  /** Marks partitions whose cap must be worked out again. */
  private touchCaps(partitions: ArrayLike<number>): void {
    for (let i = 0; i < partitions.length; i += 1) {
      const p = partitions[i]!;
      if (this.capDirty[p]) continue;
      this.capDirty[p] = 1;
      this.dirty.push(p);
    }
  }

  /**
   * How far each marked partition may step: to the earliest pending input, timer or crossing
   * that touches it. A partition already beyond it (a new timer, a crossing just found) undoes
   * its last step. Only partitions that a change touched are looked at, so the cost of an
   * instant does not grow with the size of the circuit.
   */
  private refreshCaps(): void {
    const partitions = this.partitions;
    this.crossing = this.crossing.filter((i) => partitions[i]!.crossed.length > 0);
    // Inputs before the cursor are handled; those at the cursor's time are not.
    const unhandled = this.inputCursor < this.inputs.length ? this.inputs[this.inputCursor]!.t : Infinity;
    while (this.dirty.length) {
      const list = this.dirty;
      this.dirty = [];
      for (const p of list) {
        this.capDirty[p] = 0;
        let cap = Infinity;
        const times = this.inputTimes[p]!;
        let next = this.inputNext[p]!;
        while (next < times.length && times[next]! < unhandled - SAME_TIME_S) next += 1;
        this.inputNext[p] = next;
        if (next < times.length) cap = times[next]!;
        for (const timer of this.timers) {
          if (timer.t >= cap) break;
          if (includes(this.touchOf[timer.behaviour]!, p)) cap = timer.t;
        }
        for (const i of this.crossing) {
          const t = partitions[i]!.time;
          if (t < cap && includes(this.crossTouch[i]!, p)) cap = t;
        }
        this.cap[p] = cap;
        const partition = partitions[p]!;
        if (partition.time > cap + SAME_TIME_S && partition.canUndo()) {
          const hadCrossing = partition.crossed.length > 0;
          partition.restore();
          this.queue.update(p);
          if (hadCrossing) {
            this.crossing = this.crossing.filter((i) => partitions[i]!.crossed.length > 0);
            this.touchCaps(this.crossTouch[p]!);
          }
        }
      }
    }
  }

  /** A partition stopped on a guard crossing: what acts on it touches its own partition and the acting behaviours' ones. */
  private crossingFound(index: number): void {
    const p = this.partitions[index]!;
    const touched = new Set<number>([index]);
    for (const g of p.crossed) {
      if (g < p.pistonGuardCount) continue;
      for (const q of this.touchOf[p.guardOwners[(g - p.pistonGuardCount) * 2]!]!) touched.add(q);
    }
    this.crossTouch[index] = [...touched];
    this.crossing.push(index);
    this.touchCaps(this.crossTouch[index]!);
  }

  /**
   * Handles everything due at instant t. Every partition has reached t, and those that
   * anything due touches stand exactly on it.
   */
  private handle(t: number, sample: Float64Array): void {
    this.time = t;
    this.flushRows(t, false);
    this.beginInstant(t);
    this.fireCrossings();
    while (this.inputCursor < this.inputs.length && this.inputs[this.inputCursor]!.t <= t + SAME_TIME_S) {
      const input = this.inputs[this.inputCursor++]!;
      const b = this.m.componentIds.get(input.component);
      if (b !== undefined) this.touchCaps(this.touchOf[b]!);
      this.applyInput(input);
    }
    this.fireDueTimers(t);
    this.settle();
    // Every partition stands on the end of the run: its last row comes from the world.
    if (t >= this.untilS - SAME_TIME_S) this.record(sample);
    else {
      const k = this.firstPending;
      if (Math.abs(k * this.intervalS - t) <= SAME_TIME_S) {
        // The row at this instant shows the state after what happened at it.
        for (const i of this.syncedList) this.partitions[i]!.writeRow(k);
        this.flushRows(t, true);
      }
    }
    this.endInstant();
  }

  private fireDueTimers(t: number): void {
    while (this.timers.length && this.timers[0]!.t <= t + SAME_TIME_S) {
      // A timer set at this very instant (a coil driving its valve) may touch partitions already past it:
      // they are brought back to it first, and the instant is handled again.
      if (!this.touchStands(this.timers[0]!.behaviour)) return;
      const timer = this.timers.shift()!;
      this.touchCaps(this.touchOf[timer.behaviour]!);
      if (timer.command) {
        const command = timer.command;
        this.withBehaviour(timer.behaviour, (b) => b.onInput?.(command, this.api));
      } else this.withBehaviour(timer.behaviour, (b) => b.onTimer?.(timer.tag, this.api));
    }
  }

  /** Every partition the behaviour touches stands on the instant (or is past it for good: a step that can no longer be undone). */
  private touchStands(behaviour: number): boolean {
    for (const p of this.touchOf[behaviour]!) if (!this.standsHere(p)) return false;
    return true;
  }

  /**
   * The partition stands on the instant being handled — or is past it by a step that can no
   * longer be undone (a crossing found while re-running a step, rare), and then acts from
   * where it stands.
   */
  private standsHere(p: number): boolean {
    if (this.synced[p]) return true;
    const partition = this.partitions[p]!;
    return partition.time > this.time + SAME_TIME_S && !partition.canUndo();
  }

  private beginInstant(t: number): void {
    this.syncedList = [];
    for (let i = 0; i < this.partitions.length; i += 1) {
      if (Math.abs(this.partitions[i]!.time - t) <= SAME_TIME_S) {
        this.synced[i] = 1;
        this.syncedList.push(i);
        this.partitions[i]!.ensureFresh();
      }
    }
    this.handling = true;
  }

  private endInstant(): void {
    for (const i of this.syncedList) this.synced[i] = 0;
    this.syncedList = [];
    this.handling = false;
  }

  /** Acts on the crossings of the partitions standing on the instant being handled. */
  private fireCrossings(): void {
    for (const i of this.syncedList) {
      const p = this.partitions[i]!;
      if (!p.crossed.length) continue;
      const crossed = p.crossed;
      const values = p.guardValues;
      const owners = p.guardOwners;
      p.crossed = [];
      if (this.crossing.includes(i)) this.touchCaps(this.crossTouch[i]!);
      p.dirty = true;
      for (const index of crossed) {
        if (index < p.pistonGuardCount) this.firePistonGuard(p.spec.pistons[Math.floor(index / 3)]!, index % 3);
        else {
          const at = (index - p.pistonGuardCount) * 2;
          this.withBehaviour(owners[at]!, (b) => b.onGuard?.(owners[at + 1]!, (values[index] ?? 0) >= 0, this.api));
        }
      }
    }
  }

  behaviourGuards(behaviours: readonly number[], out: number[], at: number, owners: number[] | null): number {
    let n = at;
    for (const b of behaviours) {
      const g = this.m.behaviours[b]!.behaviour.guards?.(this.api);
      if (!g) continue;
      for (let i = 0; i < g.length; i += 1) {
        out[n++] = g[i]!;
        owners?.push(b, i);
      }
    }
    return n;
  }

  private firePistonGuard(k: number, which: number): void {
    const w = this.w;
    const p = this.m.pistons[k]!;
    if (w.mode[k] !== 'free') return; // leaving a stop or stiction is decided by settle() from the forces
    const partition = this.partitions[this.partitionOfPiston[k]!]!;
    if (which === 0 || which === 1) {
      w.mode[k] = which === 0 ? 'end-min' : 'end-max';
      partition.setPiston(k, which === 0 ? 0 : p.strokeM, 0);
      this.emit(p.owner, 'end-position', which === 0 ? 'retracted' : 'extended');
    } else {
      w.mode[k] = 'stuck';
      partition.setPiston(k, w.position[k]!, 0);
      this.emit(p.owner, 'stopped', `at ${(w.position[k]! * 1000).toFixed(1)} mm`);
    }
  }

  /**
   * Frees stopped pistons whose drive force overcomes breakaway, then recomputes
   * the guards of every partition that moved or changed. A partition at rest that
   * nothing touched keeps its guards.
   */
  private settle(): void {
    for (const i of this.syncedList) {
      const partition = this.partitions[i]!;
      if (partition.quiescent && !partition.dirty) continue;
      for (const k of partition.spec.pistons) this.settlePiston(partition, k);
    }
    for (const i of this.syncedList) {
      const p = this.partitions[i]!;
      if (!p.dirty && p.quiescent) continue;
      const before = p.guardValues;
      p.computeGuards();
      // A boundary pressure jumped at this instant: guards reading it cross now, not during a step.
      if (p.boundaryChanged) p.crossed = p.guardValues.flatMap((g, j) => ((before[j]! < 0 && g >= 0) || (before[j]! > 0 && g <= 0) ? [j] : []));
      p.boundaryChanged = false;
    }
    if (this.syncedList.some((i) => this.partitions[i]!.crossed.length)) {
      this.fireCrossings();
      this.settle();
    }
  }

  private settlePiston(partition: Partition, k: number): void {
    const w = this.w;
    const p = this.m.pistons[k]!;
    partition.ensureFresh();
    const drive = w.driveForce(k);
    const mode = w.mode[k]!;
    const leave =
      (mode === 'end-min' && drive > p.breakawayN) || (mode === 'end-max' && -drive > p.breakawayN) || (mode === 'stuck' && Math.abs(drive) > p.breakawayN);
    if (leave) {
      w.mode[k] = 'free';
      w.direction[k] = Math.sign(drive);
      partition.setPiston(k, w.position[k]!, 0);
      this.emit(p.owner, 'started', drive > 0 ? 'extending' : 'retracting');
    } else if (mode === 'free') {
      const v = w.velocity[k]!;
      w.direction[k] = v !== 0 ? Math.sign(v) : Math.sign(drive) || w.direction[k]!;
    }
  }

  private applyInput(input: InputEvent): void {
    const b = this.m.componentIds.get(input.component);
    if (b === undefined) {
      this.emit(input.component, 'input-ignored', `no component ${input.component}`);
      return;
    }
    this.emit(this.m.behaviours[b]!.componentId, `input-${input.action}`, input.parameter);
    this.withBehaviour(b, (behaviour) => behaviour.onInput?.({ action: input.action, parameter: input.parameter, value: input.value }, this.api));
  }

  private withBehaviour(index: number, fn: (behaviour: SolverModel['behaviours'][number]['behaviour']) => void): void {
    const previous = this.currentBehaviour;
    this.currentBehaviour = index;
    for (const i of this.syncedList) this.partitions[i]!.ensureFresh();
    const behaviour = this.m.behaviours[index]!.behaviour;
    fn(behaviour);
    this.readSignals(index);
    // Contacts that follow a coil changed with it: their components show it.
    for (const id of this.m.control.drainChanged()) this.readSignals(this.m.componentIds.get(id)!);
    // A behaviour may change what its passages do without touching an opening (a regulator's set point);
    // changed openings wake their partitions themselves.
    for (const p of this.modulatedBy[index]!) this.partitions[p]!.wake();
    const own = this.partitionOfBehaviour[index]!;
    if (own >= 0) this.partitions[own]!.dirty = true;
    this.currentBehaviour = previous;
  }

  private readSignals(index: number): void {
    const signals = this.m.behaviours[index]!.behaviour.signals?.();
    if (!signals) return;
    let col = this.signalColumn[index]!;
    for (const key in signals) this.constants[col++] = signals[key]!;
  }

  /**
   * A behaviour acting at an instant may only read or change partitions standing on it
   * (its touch set). Anything else is a fault in the touch sets, not in the user's circuit.
   */
  private mustStandHere(partition: number): void {
    if (partition < 0) return;
    if (this.standsHere(partition)) {
      this.partitions[partition]!.ensureFresh();
      return;
    }
    throw new Error(`internal: ${this.m.behaviours[this.currentBehaviour]?.tag ?? 'a behaviour'} acted on a partition that is not at t = ${this.time} s`);
  }

  private emit(componentId: string, kind: string, detail?: string): void {
    this.sink.event({ t: this.time, componentId, kind, ...(detail ? { detail } : {}) });
  }

  private airBudget(): number {
    return this.partitions.reduce((sum, p) => sum + p.airBudget(), 0);
  }

  /** Timers in time order, and in the order they were set at equal times. */
  private addTimer(timer: Timer): void {
    const at = this.timers.findIndex((x) => x.t > timer.t);
    if (at < 0) this.timers.push(timer);
    else this.timers.splice(at, 0, timer);
    this.touchCaps(this.touchOf[timer.behaviour]!);
  }

  private makeApi(): RuntimeApi {
    const timeOf = () => this.time;
    const w = this.w;
    return {
      get time() {
        return timeOf();
      },
      pressure: (ref: NodeRef) => {
        if (this.handling) this.mustStandHere(this.partitionOfFreeNode[ref.node]!);
        return w.pressure[ref.node]!;
      },
      ambientPa: () => this.m.ambientPa,
      position: (ref: PistonRef) => {
        if (this.handling) this.mustStandHere(this.partitionOfPiston[ref.piston]!);
        return w.position[ref.piston]!;
      },
      velocity: (ref: PistonRef) => {
        if (this.handling) this.mustStandHere(this.partitionOfPiston[ref.piston]!);
        return w.velocity[ref.piston]!;
      },
      setOpening: (ref: RestrictionRef, opening: number) => {
        if (this.handling) this.mustStandHere(this.partitionOfRestriction[ref.restriction]!);
        if (w.opening[ref.restriction] === opening) return;
        w.opening[ref.restriction] = opening;
        const p = this.partitionOfRestriction[ref.restriction]!;
        if (p >= 0) this.partitions[p]!.wake();
      },
      setFixedPressure: (ref: NodeRef, pressurePa: number) => {
        if (this.handling) for (const p of this.partitionsOfFixedNode.get(ref.node) ?? []) this.mustStandHere(p);
        w.fixedPressure[ref.node] = pressurePa;
        w.pressure[ref.node] = pressurePa;
        for (const p of this.partitionsOfFixedNode.get(ref.node) ?? []) {
          this.partitions[p]!.wake();
          this.partitions[p]!.boundaryChanged = true;
        }
      },
      schedule: (delayS: number, tag: string) => this.addTimer({ t: this.time + Math.max(delayS, 0), seq: this.timerSeq++, behaviour: this.currentBehaviour, tag }),
      send: (target: string, command: InputCommand, delayS = 0) => {
        const behaviour = this.m.componentIds.get(target);
        if (behaviour === undefined) {
          this.emit(this.m.behaviours[this.currentBehaviour]?.componentId ?? '', 'input-ignored', `no component ${target}`);
          return;
        }
        this.addTimer({ t: this.time + Math.max(delayS, 0), seq: this.timerSeq++, behaviour, tag: '', command });
      },
      cancel: (tag: string) => {
        for (let i = this.timers.length - 1; i >= 0; i -= 1) {
          if (this.timers[i]!.behaviour === this.currentBehaviour && !this.timers[i]!.command && this.timers[i]!.tag === tag) {
            this.touchCaps(this.touchOf[this.currentBehaviour]!);
            this.timers.splice(i, 1);
          }
        }
      },
      event: (kind: string, detail?: string) => this.emit(this.m.behaviours[this.currentBehaviour]?.componentId ?? '', kind, detail),
    };
  }

  // ---- trace ---------------------------------------------------------------

  private signalNames(): Array<{ name: string; unit: SignalUnit }> {
    const names: Array<{ name: string; unit: SignalUnit }> = this.m.portNodes.map((p) => ({ name: p.signal, unit: 'Pa' as const }));
    this.m.pistons.forEach((p) => names.push({ name: `${p.owner}:x`, unit: 'm' }, { name: `${p.owner}:v`, unit: 'm/s' }));
    if (this.recordFlows) this.m.restrictions.forEach((r) => names.push({ name: `${r.owner}:q:${r.name}`, unit: 'kg/s' }));
    this.m.behaviours.forEach((b) => {
      for (const key of Object.keys(b.behaviour.signals?.() ?? {})) names.push({ name: `${b.componentId}:${key}`, unit: 'state' });
    });
    for (const wire of this.m.wireNets) names.push({ name: `${wire.wireId}:live`, unit: 'state' });
    return names;
  }

  private readonly scratch = { flow: 0, dFlowdPa: 0, dFlowdPb: 0 };

  private record(out: Float64Array): void {
    for (const p of this.partitions) p.ensureFresh();
    this.sampleBoundaries();
    this.sampleInto(out);
    this.sink.sample(this.time, out);
  }

  /** Boundary pressures and the flows between boundaries into the constant columns, as they are now. */
  private sampleBoundaries(): void {
    const w = this.w;
    const out = this.constants;
    // Wires are live or dead as the control circuit last settled, which happens only at instants.
    this.m.wireNets.forEach((wire, i) => (out[this.wireColumn + i] = this.m.control.netLive(wire.net) ? 1 : 0));
    const ports = this.boundaryPortColumns;
    for (let j = 0; j < ports.length; j += 2) out[ports[j]!] = w.pressure[ports[j + 1]!]!;
    const flows = this.boundaryFlowColumns;
    for (let j = 0; j < flows.length; j += 2) out[flows[j]!] = this.boundaryFlow(flows[j + 1]!);
  }

  /** Flow through a passage between two boundaries: nothing integrates it, but it is still worth showing. */
  private boundaryFlow(r: number): number {
    const spec = this.m.restrictions[r]!;
    signedIsoFlowInto(this.scratch, this.w.gain[r]!, spec.criticalRatio, 0.5, this.w.pressure[spec.from]!, this.w.pressure[spec.to]!, ISO_LINEAR_REGION_EPSILON);
    return this.w.opening[r]! * this.scratch.flow;
  }

  /** Every trace value as the world holds it now. */
  private sampleInto(out: Float64Array): void {
    const w = this.w;
    let i = 0;
    for (const p of this.m.portNodes) out[i++] = w.pressure[p.node]!;
    this.m.pistons.forEach((_, k) => {
      out[i++] = w.position[k]!;
      out[i++] = w.velocity[k]!;
    });
    if (this.recordFlows) {
      for (let r = 0; r < this.m.restrictions.length; r += 1) {
        out[i++] = this.partitionOfRestriction[r]! >= 0 ? w.flow[r]! : this.boundaryFlow(r);
      }
    }
    out.set(this.constants.subarray(i), i);
  }
}
