import { R_AIR_J_PER_KG_K } from '../calc/constants';
import { chokedGain } from '../calc/iso6358';
import type { SolverModel } from './model';
import { flags, floats } from './typed-arrays';

export type PistonMode = 'free' | 'stuck' | 'end-min' | 'end-max';

/**
 * Values every partition reads and writes, indexed by global node, restriction
 * and piston. A partition only writes the entries of what it owns; fixed
 * (boundary) pressures change only at synchronisation points.
 */
export class World {
  readonly model: SolverModel;
  /** R·T of the (isothermal) gas, J/kg. */
  readonly rt: number;
  readonly pressure: Float64Array;
  readonly volume: Float64Array;
  /** ∂p/∂m of each free node at the last evaluation, Pa/kg (RT/V when isothermal, n·p/m when polytropic). */
  readonly pressurePerMass: Float64Array;
  readonly fixedPressure: Float64Array;
  /** 1 for boundary nodes (atmosphere, ideal supplies), whose pressure no flow changes. */
  readonly isFixed: Uint8Array;
  readonly opening: Float64Array;
  readonly gain: Float64Array;
  readonly flow: Float64Array;
  readonly dFlowA: Float64Array;
  readonly dFlowB: Float64Array;
  readonly dFlowC: Float64Array;
  readonly position: Float64Array;
  readonly velocity: Float64Array;
  readonly mode: PistonMode[];
  /** Sign of motion used for Coulomb friction while free. */
  readonly direction: Float64Array;

  constructor(model: SolverModel) {
    this.model = model;
    this.rt = R_AIR_J_PER_KG_K * model.temperatureK;
    const nn = model.nodes.length;
    const nr = model.restrictions.length;
    const np = model.pistons.length;
    this.pressure = floats(model.nodes, (n) => (n.fixed ? n.fixedPressurePa : model.ambientPa));
    this.volume = new Float64Array(nn);
    this.pressurePerMass = new Float64Array(nn);
    this.fixedPressure = floats(model.nodes, (n) => n.fixedPressurePa);
    this.isFixed = flags(model.nodes, (n) => n.fixed);
    this.opening = floats(model.restrictions, (r) => r.opening);
    this.gain = floats(model.restrictions, (r) => chokedGain(r.conductance, model.temperatureK));
    this.flow = new Float64Array(nr);
    this.dFlowA = new Float64Array(nr);
    this.dFlowB = new Float64Array(nr);
    this.dFlowC = new Float64Array(nr);
    this.position = floats(model.pistons, (p) => Math.min(Math.max(p.startPositionM, 0), p.strokeM));
    this.velocity = new Float64Array(np);
    this.mode = model.pistons.map((p, k) => (this.position[k]! <= 0 ? 'end-min' : this.position[k]! >= p.strokeM ? 'end-max' : 'stuck'));
    this.direction = new Float64Array(np);
  }

  /** Net force on piston k towards extension, without friction, from the current pressures, N. */
  driveForce(k: number): number {
    const p = this.model.pistons[k]!;
    const x = Math.min(Math.max(this.position[k]!, 0), p.strokeM);
    const pCap = this.pressure[p.capNode]!;
    const pRod = p.rodNode === null ? this.model.ambientPa : this.pressure[p.rodNode]!;
    const spring = p.springPreloadN + p.springRateNPerM * x;
    return pCap * p.capArea - pRod * p.rodSideArea - this.model.ambientPa * p.ambientArea - p.loadN - spring;
  }
}
