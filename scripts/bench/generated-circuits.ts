import { circuitDocumentSchema, type CircuitDocument } from '@/engine/document/schema';
import type { InputEvent } from '@/engine/solver/simulate';

/**
 * Benchmark circuits of a given size: one supply feeding repeated cells of a
 * 3/2 push-button valve piloting a 5/2 valve that drives a double-acting
 * cylinder through two one-way flow controls (five components a cell).
 * Each cell's button is held for 1 s every 2 s, cells staggered, so the
 * cylinders keep moving through the whole run.
 */
export function generatedCircuit(targetComponents: number): { document: CircuitDocument; inputs: InputEvent[] } {
  const cells = Math.max(1, Math.round((targetComponents - 1) / 5));
  const components: unknown[] = [{ id: 'supply', type: 'air-supply', tag: '0Z1', position: { x: 0, y: 0 }, parameters: {} }];
  const tubes: unknown[] = [];
  const inputs: InputEvent[] = [];
  const tube = (id: string, a: string, pa: string, b: string, pb: string, lengthM = 0.5) =>
    tubes.push({ id, from: { component: a, port: pa }, to: { component: b, port: pb }, lengthM, innerDiameterM: 0.004 });
  for (let c = 0; c < cells; c += 1) {
    const n = c + 1;
    const at = (dx: number, dy: number) => ({ x: 200 * c + dx, y: dy });
    components.push(
      { id: `b${n}`, type: 'valve-3-2-nc', tag: `${n}S1`, position: at(0, 300), parameters: { actuation: 'pushbutton' } },
      { id: `v${n}`, type: 'valve-5-2', tag: `${n}V1`, position: at(0, 200), parameters: { actuation: 'pilot', returnBy: 'spring' } },
      { id: `fa${n}`, type: 'one-way-flow-control', tag: `${n}V2`, position: at(-40, 100), parameters: { opening: 0.4 } },
      { id: `fb${n}`, type: 'one-way-flow-control', tag: `${n}V3`, position: at(40, 100), parameters: { opening: 0.4 } },
      { id: `c${n}`, type: 'cylinder-double-acting', tag: `${n}A1`, position: at(0, 0), parameters: { bore: 0.032, rod: 0.012, stroke: 0.1 } },
    );
    tube(`s${n}a`, 'supply', '2', `b${n}`, '1', 1);
    tube(`s${n}b`, 'supply', '2', `v${n}`, '1', 1);
    tube(`p${n}`, `b${n}`, '2', `v${n}`, '14');
    tube(`wa${n}`, `v${n}`, '4', `fa${n}`, '1');
    tube(`ca${n}`, `fa${n}`, '2', `c${n}`, 'A', 0.1);
    tube(`wb${n}`, `v${n}`, '2', `fb${n}`, '1');
    tube(`cb${n}`, `fb${n}`, '2', `c${n}`, 'B', 0.1);
    const offset = (0.37 * c) % 2;
    for (let t = 0.1 + offset; t < 10; t += 2) {
      inputs.push({ t, component: `b${n}`, action: 'press' }, { t: t + 1, component: `b${n}`, action: 'release' });
    }
  }
  const document = circuitDocumentSchema.parse({ schemaVersion: 1, components, tubes });
  return { document, inputs };
}

/**
 * The same cells driven electrically: each push-button feeds a relay, whose contact
 * energises the solenoid of a single-solenoid 5/2 valve (eight components a cell, plus
 * one air and one 24 V DC supply). Buttons are pressed as in `generatedCircuit`.
 */
export function generatedElectroCircuit(targetComponents: number): { document: CircuitDocument; inputs: InputEvent[] } {
  const cells = Math.max(1, Math.round((targetComponents - 2) / 8));
  const components: unknown[] = [
    { id: 'supply', type: 'air-supply', tag: '0Z1', position: { x: 0, y: 0 }, parameters: {} },
    { id: 'g1', type: 'dc-supply', tag: 'G1', position: { x: 0, y: 400 }, parameters: {} },
  ];
  const tubes: unknown[] = [];
  const wires: unknown[] = [];
  const inputs: InputEvent[] = [];
  const tube = (id: string, a: string, pa: string, b: string, pb: string, lengthM = 0.5) =>
    tubes.push({ id, from: { component: a, port: pa }, to: { component: b, port: pb }, lengthM, innerDiameterM: 0.004 });
  const wire = (id: string, a: string, pa: string, b: string, pb: string) => wires.push({ id, from: { component: a, port: pa }, to: { component: b, port: pb } });
  for (let c = 0; c < cells; c += 1) {
    const n = c + 1;
    const at = (dx: number, dy: number) => ({ x: 200 * c + dx, y: dy });
    components.push(
      { id: `s${n}`, type: 'pushbutton-no', tag: `S${n}`, position: at(0, 500), parameters: {} },
      { id: `k${n}`, type: 'relay-coil', tag: `K${n}`, position: at(0, 600), parameters: {} },
      { id: `kc${n}`, type: 'relay-contact-no', tag: `K${n}.1`, position: at(60, 500), parameters: { coil: `K${n}` } },
      { id: `m${n}`, type: 'solenoid-coil', tag: `${n}M1`, position: at(60, 600), parameters: { valve: `${n}V1`, side: '14' } },
      { id: `v${n}`, type: 'valve-5-2', tag: `${n}V1`, position: at(0, 200), parameters: { actuation: 'solenoid', returnBy: 'spring' } },
      { id: `fa${n}`, type: 'one-way-flow-control', tag: `${n}V2`, position: at(-40, 100), parameters: { opening: 0.4 } },
      { id: `fb${n}`, type: 'one-way-flow-control', tag: `${n}V3`, position: at(40, 100), parameters: { opening: 0.4 } },
      { id: `c${n}`, type: 'cylinder-double-acting', tag: `${n}A1`, position: at(0, 0), parameters: { bore: 0.032, rod: 0.012, stroke: 0.1 } },
    );
    tube(`s${n}`, 'supply', '2', `v${n}`, '1', 1);
    tube(`wa${n}`, `v${n}`, '4', `fa${n}`, '1');
    tube(`ca${n}`, `fa${n}`, '2', `c${n}`, 'A', 0.1);
    tube(`wb${n}`, `v${n}`, '2', `fb${n}`, '1');
    tube(`cb${n}`, `fb${n}`, '2', `c${n}`, 'B', 0.1);
    wire(`e${n}a`, 'g1', 'L+', `s${n}`, '13');
    wire(`e${n}b`, `s${n}`, '14', `k${n}`, 'A1');
    wire(`e${n}c`, `k${n}`, 'A2', 'g1', 'M');
    wire(`e${n}d`, 'g1', 'L+', `kc${n}`, '13');
    wire(`e${n}e`, `kc${n}`, '14', `m${n}`, 'A1');
    wire(`e${n}f`, `m${n}`, 'A2', 'g1', 'M');
    const offset = (0.37 * c) % 2;
    for (let t = 0.1 + offset; t < 10; t += 2) {
      inputs.push({ t, component: `s${n}`, action: 'press' }, { t: t + 1, component: `s${n}`, action: 'release' });
    }
  }
  const document = circuitDocumentSchema.parse({ schemaVersion: 1, components, tubes, wires });
  return { document, inputs };
}
