import { ISO_LINEAR_REGION_EPSILON, signedIsoFlowInto } from '../calc/iso6358';
import type { InputCommand, NodeRef, PistonRef, RestrictionRef, RuntimeApi } from '../components/types';
import { MemoryTraceSink, type SignalUnit, type Trace, type TraceSink } from '../trace/trace';
import type { SolverModel } from './model';
import { buildPartitions } from './partitioning';
import { OutputKind, Partition, type GuardSource, type OutputRows } from './partition';
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
}

/**
 * Output rows kept pending between meeting points. Partitions step past output times
 * and fill their columns by interpolation; the rows go to the sink once every partition
 * has passed them. Meeting points are at least this often, which bounds the buffer.
 */
const PENDING_ROWS = 64;

interface Timer {
  t: number;
  seq: number;
  behaviour: number;
  tag: string;
}

/**
 * Runs a compiled model from t = 0 to `untilS` with the given inputs and returns
 * the trace (or streams it into `sink`). Deterministic: the same model, inputs
 * and options give the same trace bit for bit (no randomness, no clock reads,
 * fixed iteration order).
 */
export function simulate(model: SolverModel, inputs: readonly InputEvent[], options: SimulationOptions, sink?: TraceSink): Trace {
  return new Run(model, options, sink).execute([...inputs].sort((a, b) => a.t - b.t));
}

class Run implements GuardSource, OutputRows {
  private readonly m: SolverModel;
  private readonly w: World;
  private readonly partitions: Partition[];
  private readonly partitionOfRestriction: Int32Array;
  private readonly partitionOfPiston: Int32Array;
  private readonly partitionsOfFixedNode = new Map<number, number[]>();
  /** The partition whose guards each behaviour's guards belong to (-1: none). */
  private readonly partitionOfBehaviour: Int32Array;
  /** Partitions holding each behaviour's passages and pistons: woken whenever the behaviour acts. */
  private readonly partitionsOwnedBy: number[][];
  private readonly untilS: number;
  private readonly sink: TraceSink;
  private readonly memory: MemoryTraceSink | null;
  private readonly recordFlows: boolean;
  private readonly api: RuntimeApi;
  private readonly timers: Timer[] = [];
  private timerSeq = 0;
  private time = 0;
  private currentBehaviour = -1;
  private readonly initialBudget: number;
  private readonly behind: number[] = [];
  readonly intervalS: number;
  /** Ring of pending output rows; row k lives at k mod PENDING_ROWS while firstPending ≤ k < firstPending + PENDING_ROWS. */
  private readonly pending: Float64Array[] = [];
  private firstPending = 1;
  /** Columns that no partition fills: boundary pressures, passages between boundaries, behaviour signals. */
  private constantColumns = new Int32Array(0);

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
    this.partitions = specs.map((spec) => new Partition(this.w, spec, tol, this));
    this.partitionOfRestriction = new Int32Array(model.restrictions.length).fill(-1);
    this.partitionOfPiston = new Int32Array(model.pistons.length).fill(-1);
    this.partitionOfBehaviour = new Int32Array(model.behaviours.length).fill(-1);
    specs.forEach((spec, i) => {
      for (const b of spec.behaviours) this.partitionOfBehaviour[b] = i;
      for (const r of spec.restrictions) this.partitionOfRestriction[r] = i;
      for (const k of spec.pistons) this.partitionOfPiston[k] = i;
      for (const node of new Set([...spec.fixedNodes, ...spec.watchedBoundaries])) {
        this.partitionsOfFixedNode.set(node, [...(this.partitionsOfFixedNode.get(node) ?? []), i]);
      }
    });
    this.partitionsOwnedBy = model.behaviours.map((entry) => {
      const owned = new Set<number>();
      model.restrictions.forEach((r, index) => {
        if (r.owner === entry.componentId && this.partitionOfRestriction[index]! >= 0) owned.add(this.partitionOfRestriction[index]!);
      });
      model.pistons.forEach((p, k) => {
        if (p.owner === entry.componentId) owned.add(this.partitionOfPiston[k]!);
      });
      return [...owned].sort((a, b) => a - b);
    });
    this.initialBudget = this.airBudget();
  }

  row(k: number): Float64Array | null {
    return k >= this.firstPending && k < this.firstPending + PENDING_ROWS ? this.pending[k % PENDING_ROWS]! : null;
  }

  /** Tells each partition which trace columns it fills between meeting points. */
  private assignColumns(width: number): void {
    const columns = this.partitions.map(() => ({ cols: [] as number[], kinds: [] as OutputKind[], sources: [] as number[] }));
    const owned = new Uint8Array(width);
    const partitionOfNode = new Int32Array(this.m.nodes.length).fill(-1);
    this.partitions.forEach((p, i) => {
      for (const node of p.spec.freeNodes) partitionOfNode[node] = i;
    });
    const claim = (partition: number, col: number, kind: OutputKind, source: number) => {
      if (partition < 0) return;
      columns[partition]!.cols.push(col);
      columns[partition]!.kinds.push(kind);
      columns[partition]!.sources.push(source);
      owned[col] = 1;
    };
    let col = 0;
    for (const p of this.m.portNodes) claim(partitionOfNode[p.node]!, col++, OutputKind.Pressure, p.node);
    this.m.pistons.forEach((_, k) => {
      claim(this.partitionOfPiston[k]!, col++, OutputKind.Position, k);
      claim(this.partitionOfPiston[k]!, col++, OutputKind.Velocity, k);
    });
    if (this.recordFlows) for (let r = 0; r < this.m.restrictions.length; r += 1) claim(this.partitionOfRestriction[r]!, col++, OutputKind.Flow, r);
    this.partitions.forEach((p, i) => p.setOutputs(columns[i]!.cols, columns[i]!.kinds, columns[i]!.sources, this));
    const constant: number[] = [];
    for (let c = 0; c < width; c += 1) if (!owned[c]) constant.push(c);
    this.constantColumns = Int32Array.from(constant);
    for (let i = 0; i < PENDING_ROWS; i += 1) this.pending.push(new Float64Array(width));
  }

  /**
   * Sends the pending rows before `reached` to the sink. The columns no partition fills
   * hold still between meeting points: they are taken from the world as it is now.
   */
  private flushRows(reached: number, sample: Float64Array): void {
    if (this.firstPending * this.intervalS >= reached - 1e-12) return;
    this.sampleInto(sample);
    const constant = this.constantColumns;
    while (this.firstPending * this.intervalS < reached - 1e-12 && this.firstPending * this.intervalS < this.untilS - 1e-12) {
      const k = this.firstPending;
      const row = this.pending[k % PENDING_ROWS]!;
      for (let i = 0; i < constant.length; i += 1) row[constant[i]!] = sample[constant[i]!]!;
      this.sink.sample(k * this.intervalS, row);
      this.firstPending += 1;
    }
  }

  execute(inputs: InputEvent[]): Trace {
    const names = this.signalNames();
    this.sink.begin(names);
    const sample = new Float64Array(names.length);
    this.assignColumns(names.length);
    for (const p of this.partitions) p.refresh();
    this.m.behaviours.forEach((_, i) => this.withBehaviour(i, (b) => b.start?.(this.api)));
    this.settle();
    // Conditions already true at the start count as having just become true.
    for (const p of this.partitions) p.crossed = p.guardValues.flatMap((g, i) => (i >= p.pistonGuardCount && g > 0 ? [i] : []));
    this.fireCrossings();
    this.settle();
    this.record(sample);

    let inputCursor = 0;
    while (this.time < this.untilS - 1e-12) {
      // Partitions meet at inputs, timers and events (and often enough to bound the pending rows),
      // not at every output time.
      const lastPending = Math.min((this.firstPending + PENDING_ROWS - 1) * this.intervalS, this.untilS);
      const nextInput = inputs[inputCursor]?.t ?? Infinity;
      const nextTimer = this.timers[0]?.t ?? Infinity;
      const target = Math.max(Math.min(lastPending, nextInput, nextTimer), this.time);
      const reached = this.advanceAll(target);
      this.time = reached;
      this.flushRows(reached, sample);
      this.fireCrossings();
      if (reached >= target - 1e-12) {
        while (inputCursor < inputs.length && inputs[inputCursor]!.t <= this.time + 1e-12) this.applyInput(inputs[inputCursor++]!);
        while (this.timers.length && this.timers[0]!.t <= this.time + 1e-12) {
          const timer = this.timers.shift()!;
          this.withBehaviour(timer.behaviour, (b) => b.onTimer?.(timer.tag, this.api));
        }
      }
      this.settle();
      const nextOutput = Math.min(this.firstPending * this.intervalS, this.untilS);
      if (this.time >= nextOutput - 1e-12) {
        this.record(sample);
        this.firstPending += 1;
      }
    }
    const steps = this.partitions.reduce((s, p) => s + p.steps, 0);
    const rejectedSteps = this.partitions.reduce((s, p) => s + p.rejected, 0);
    const stats = { steps, rejectedSteps, massBalanceErrorKg: this.airBudget() - this.initialBudget };
    return this.memory ? this.memory.toTrace(this.intervalS, stats) : { formatVersion: 1, intervalS: this.intervalS, time: [], signals: [], events: [], stats };
  }

  /**
   * Brings every partition from the common time to `target`, or to the earliest
   * guard crossing before it. Partitions take their steps in time order (the one
   * furthest behind steps next), so when one finds a crossing every other partition
   * has at most its last step beyond it: that step is undone and re-run to the
   * crossing, and all partitions meet at the same instant.
   */
  private advanceAll(target: number): number {
    let horizon = target;
    const partitions = this.partitions;
    // Partitions still behind the horizon, in a binary heap by (time, index).
    const heap = this.behind;
    const before = (a: number, b: number) => {
      const ta = partitions[a]!.time;
      const tb = partitions[b]!.time;
      return ta < tb || (ta === tb && a < b);
    };
    const push = (i: number) => {
      let at = heap.length;
      heap.push(i);
      while (at > 0) {
        const parent = (at - 1) >> 1;
        if (!before(heap[at]!, heap[parent]!)) break;
        [heap[at], heap[parent]] = [heap[parent]!, heap[at]!];
        at = parent;
      }
    };
    const pop = (): number => {
      const top = heap[0]!;
      const last = heap.pop()!;
      if (heap.length) {
        heap[0] = last;
        let at = 0;
        for (;;) {
          const l = 2 * at + 1;
          const r = l + 1;
          let m = at;
          if (l < heap.length && before(heap[l]!, heap[m]!)) m = l;
          if (r < heap.length && before(heap[r]!, heap[m]!)) m = r;
          if (m === at) break;
          [heap[at], heap[m]] = [heap[m]!, heap[at]!];
          at = m;
        }
      }
      return top;
    };
    heap.length = 0;
    for (let i = 0; i < partitions.length; i += 1) if (partitions[i]!.time < horizon - 1e-12) push(i);
    while (heap.length) {
      const index = pop();
      const next = partitions[index]!;
      next.snapshot();
      next.advanceStep(horizon);
      if (next.crossed.length && next.time < horizon - 1e-12) {
        horizon = next.time;
        heap.length = 0;
        for (let i = 0; i < partitions.length; i += 1) {
          const p = partitions[i]!;
          if (p !== next && p.time > horizon + 1e-12) p.restore();
          if (p.time < horizon - 1e-12) push(i);
        }
      } else if (next.time < horizon - 1e-12) push(index);
    }
    return horizon;
  }

  private fireCrossings(): void {
    for (const p of this.partitions) {
      if (!p.crossed.length) continue;
      const crossed = p.crossed;
      const values = p.guardValues;
      const owners = p.guardOwners;
      p.crossed = [];
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

  behaviourGuards(behaviours: readonly number[], out: number[], owners: number[]): void {
    for (const b of behaviours) {
      const g = this.m.behaviours[b]!.behaviour.guards?.(this.api) ?? [];
      for (let i = 0; i < g.length; i += 1) {
        out.push(g[i]!);
        owners.push(b, i);
      }
    }
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
    const w = this.w;
    this.m.pistons.forEach((p, k) => {
      const partition = this.partitions[this.partitionOfPiston[k]!]!;
      if (partition.quiescent && !partition.dirty) return;
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
    });
    for (const p of this.partitions) {
      if (!p.dirty && p.quiescent) continue;
      const before = p.guardValues;
      p.computeGuards();
      // A boundary pressure jumped at this instant: guards reading it cross now, not during a step.
      if (p.boundaryChanged) p.crossed = p.guardValues.flatMap((g, i) => ((before[i]! < 0 && g >= 0) || (before[i]! > 0 && g <= 0) ? [i] : []));
      p.boundaryChanged = false;
    }
    if (this.partitions.some((p) => p.crossed.length)) {
      this.fireCrossings();
      this.settle();
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
    for (const p of this.partitions) p.ensureFresh();
    fn(this.m.behaviours[index]!.behaviour);
    // A behaviour may change what its passages do without touching an opening (a regulator's set point).
    for (const p of this.partitionsOwnedBy[index]!) this.partitions[p]!.wake();
    const own = this.partitionOfBehaviour[index]!;
    if (own >= 0) this.partitions[own]!.dirty = true;
    this.currentBehaviour = previous;
  }

  private emit(componentId: string, kind: string, detail?: string): void {
    this.sink.event({ t: this.time, componentId, kind, ...(detail ? { detail } : {}) });
  }

  private airBudget(): number {
    return this.partitions.reduce((sum, p) => sum + p.airBudget(), 0);
  }

  private makeApi(): RuntimeApi {
    const timeOf = () => this.time;
    const w = this.w;
    return {
      get time() {
        return timeOf();
      },
      pressure: (ref: NodeRef) => w.pressure[ref.node]!,
      ambientPa: () => this.m.ambientPa,
      position: (ref: PistonRef) => w.position[ref.piston]!,
      velocity: (ref: PistonRef) => w.velocity[ref.piston]!,
      setOpening: (ref: RestrictionRef, opening: number) => {
        if (w.opening[ref.restriction] === opening) return;
        w.opening[ref.restriction] = opening;
        const p = this.partitionOfRestriction[ref.restriction]!;
        if (p >= 0) this.partitions[p]!.wake();
      },
      setFixedPressure: (ref: NodeRef, pressurePa: number) => {
        w.fixedPressure[ref.node] = pressurePa;
        w.pressure[ref.node] = pressurePa;
        for (const p of this.partitionsOfFixedNode.get(ref.node) ?? []) {
          this.partitions[p]!.wake();
          this.partitions[p]!.boundaryChanged = true;
        }
      },
      schedule: (delayS: number, tag: string) => {
        const timer = { t: this.time + Math.max(delayS, 0), seq: this.timerSeq++, behaviour: this.currentBehaviour, tag };
        const at = this.timers.findIndex((x) => x.t > timer.t);
        if (at < 0) this.timers.push(timer);
        else this.timers.splice(at, 0, timer);
      },
      cancel: (tag: string) => {
        for (let i = this.timers.length - 1; i >= 0; i -= 1) {
          if (this.timers[i]!.behaviour === this.currentBehaviour && this.timers[i]!.tag === tag) this.timers.splice(i, 1);
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
    return names;
  }

  private readonly scratch = { flow: 0, dFlowdPa: 0, dFlowdPb: 0 };

  private record(out: Float64Array): void {
    for (const p of this.partitions) p.ensureFresh();
    this.sampleInto(out);
    this.sink.sample(this.time, out);
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
        if (this.partitionOfRestriction[r]! >= 0) out[i++] = w.flow[r]!;
        else {
          // Between two boundaries: nothing integrates it, but its flow is still worth showing.
          const spec = this.m.restrictions[r]!;
          signedIsoFlowInto(this.scratch, w.gain[r]!, spec.criticalRatio, 0.5, w.pressure[spec.from]!, w.pressure[spec.to]!, ISO_LINEAR_REGION_EPSILON);
          out[i++] = w.opening[r]! * this.scratch.flow;
        }
      }
    }
    for (const b of this.m.behaviours) for (const value of Object.values(b.behaviour.signals?.() ?? {})) out[i++] = value;
  }
}
