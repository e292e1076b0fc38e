import type { CircuitDocument } from '@/engine/document/schema';
import { applyFault } from '@/engine/faults';
import type { Trace } from '@/engine/trace/trace';
import { cylinderRig, lamp, meterOut, pressFor, runCircuit, strokeTime, valueAt, withSupply } from '../components/harness';
import type { TestCircuit } from '../support/circuit';

/** Out at 0.1 s, back at 1.5 s: long enough for every stroke here to end. */
export const PRESS_S = 0.1;
export const RELEASE_S = 1.5;
export const CYCLE = pressFor('v', PRESS_S, RELEASE_S - PRESS_S);
export const UNTIL_S = 3;

/** A run of the drawing with one fault (or none). */
export function runWith(document: CircuitDocument, fault?: { faultId: string; tag: string; severity: number }): Trace {
  return runCircuit(fault ? applyFault(document, fault) : document, CYCLE, UNTIL_S);
}

/** Extension and retraction times of cylinder `cyl` over the cycle, s. */
export function strokes(trace: Trace): { extend: number; retract: number } {
  return { extend: strokeTime(trace, 'cyl', 'extended', PRESS_S), retract: strokeTime(trace, 'cyl', 'retracted', RELEASE_S) };
}

/** Cap minus rod pressure of `cyl` just before the release, Pa: what holds the extended load. */
export function endPressureDifference(trace: Trace): number {
  return valueAt(trace, 'cyl:p:A', RELEASE_S - 0.05) - valueAt(trace, 'cyl:p:B', RELEASE_S - 0.05);
}

/**
 * The cylinder rig of the component tests (5/2 pushbutton valve `v`, double-acting `cyl`) with
 * a meter-out one-way flow control `fc` on the rod side, a silencer `sil` on exhaust 3, and a
 * reed sensor `B1` at `sensorAtM` lighting lamp `H1`.
 */
export function clampRig(opening = 0.3, sensorAtM = 0.05): TestCircuit {
  const c = cylinderRig({ lineB: meterOut('fc', opening) })
    .add('sil', 'silencer')
    .tube('v:3', 'sil:1')
    .add('ps', 'dc-supply')
    .add('B1', 'proximity-sensor-reed')
    .link('cyl', 'B1', sensorAtM)
    .wire('ps:L+', 'B1:BN')
    .wire('B1:BU', 'ps:M');
  return lamp(c, 'H1', 'B1:BK');
}

/** A single-acting cylinder `cyl` on a 3/2 pushbutton valve `v` from a 6 bar supply `sup`. */
export function springRig(): TestCircuit {
  return withSupply(6).add('v', 'valve-3-2-nc').add('cyl', 'cylinder-single-acting').tube('sup:2', 'v:1').tube('v:2', 'cyl:A');
}
