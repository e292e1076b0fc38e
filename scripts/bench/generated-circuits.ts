import { circuitDocumentSchema, type CircuitDocument } from '@/engine/document/schema';
import type { InputEvent } from '@/engine/solver/simulate';

type Position = { x: number; y: number };

/** What every benchmark cell shares: the document's lists, and a tube helper. */
class CellBuilder {
  readonly components: unknown[] = [];
  readonly tubes: unknown[] = [];
  readonly wires: unknown[] = [];
  readonly inputs: InputEvent[] = [];

  tube(id: string, a: string, pa: string, b: string, pb: string, lengthM = 0.5): void {
    this.tubes.push({ id, from: { component: a, port: pa }, to: { component: b, port: pb }, lengthM, innerDiameterM: 0.004 });
  }

  wire(id: string, a: string, pa: string, b: string, pb: string): void {
    this.wires.push({ id, from: { component: a, port: pa }, to: { component: b, port: pb } });
  }

  /** Two one-way flow controls (meter-out both ways) and a double-acting cylinder on the 5/2 valve `v<n>`. */
  cylinder(n: number, at: (dx: number, dy: number) => Position): void {
    this.components.push(
      { id: `fa${n}`, type: 'one-way-flow-control', tag: `${n}V2`, position: at(-40, 100), parameters: { opening: 0.4 } },
      { id: `fb${n}`, type: 'one-way-flow-control', tag: `${n}V3`, position: at(40, 100), parameters: { opening: 0.4 } },
      { id: `c${n}`, type: 'cylinder-double-acting', tag: `${n}A1`, position: at(0, 0), parameters: { bore: 0.032, rod: 0.012, stroke: 0.1 } },
    );
    this.tube(`wa${n}`, `v${n}`, '4', `fa${n}`, '1');
    this.tube(`ca${n}`, `fa${n}`, '2', `c${n}`, 'A', 0.1);
    this.tube(`wb${n}`, `v${n}`, '2', `fb${n}`, '1');
    this.tube(`cb${n}`, `fb${n}`, '2', `c${n}`, 'B', 0.1);
  }

  /** Cell c's button held for 1 s in every 2 s over 10 s, cells staggered. */
  presses(c: number, button: string): void {
    const offset = (0.37 * c) % 2;
    for (let t = 0.1 + offset; t < 10; t += 2) this.inputs.push({ t, component: button, action: 'press' }, { t: t + 1, component: button, action: 'release' });
  }

  build(): { document: CircuitDocument; inputs: InputEvent[] } {
    const document = circuitDocumentSchema.parse({ schemaVersion: 1, components: this.components, tubes: this.tubes, wires: this.wires });
    return { document, inputs: this.inputs };
  }
}

/**
 * Benchmark circuits of a given size: one supply feeding repeated cells of a
 * 3/2 push-button valve piloting a 5/2 valve that drives a double-acting
 * cylinder through two one-way flow controls (five components a cell).
 * Each cell's button is held for 1 s every 2 s, cells staggered, so the
 * cylinders keep moving through the whole run.
 */
export function generatedCircuit(targetComponents: number): { document: CircuitDocument; inputs: InputEvent[] } {
  const cells = Math.max(1, Math.round((targetComponents - 1) / 5));
  const b = new CellBuilder();
  b.components.push({ id: 'supply', type: 'air-supply', tag: '0Z1', position: { x: 0, y: 0 }, parameters: {} });
  for (let c = 0; c < cells; c += 1) {
    const n = c + 1;
    const at = (dx: number, dy: number) => ({ x: 200 * c + dx, y: dy });
    b.components.push(
      { id: `b${n}`, type: 'valve-3-2-nc', tag: `${n}S1`, position: at(0, 300), parameters: { actuation: 'pushbutton' } },
      { id: `v${n}`, type: 'valve-5-2', tag: `${n}V1`, position: at(0, 200), parameters: { actuation: 'pilot', returnBy: 'spring' } },
    );
    b.tube(`s${n}a`, 'supply', '2', `b${n}`, '1', 1);
    b.tube(`s${n}b`, 'supply', '2', `v${n}`, '1', 1);
    b.tube(`p${n}`, `b${n}`, '2', `v${n}`, '14');
    b.cylinder(n, at);
    b.presses(c, `b${n}`);
  }
  return b.build();
}

/**
 * The same cells driven electrically: each push-button feeds a relay, whose contact
 * energises the solenoid of a single-solenoid 5/2 valve (eight components a cell, plus
 * one air and one 24 V DC supply). Buttons are pressed as in `generatedCircuit`.
 */
export function generatedElectroCircuit(targetComponents: number): { document: CircuitDocument; inputs: InputEvent[] } {
  const cells = Math.max(1, Math.round((targetComponents - 2) / 8));
  const b = new CellBuilder();
  b.components.push(
    { id: 'supply', type: 'air-supply', tag: '0Z1', position: { x: 0, y: 0 }, parameters: {} },
    { id: 'g1', type: 'dc-supply', tag: 'G1', position: { x: 0, y: 400 }, parameters: {} },
  );
  for (let c = 0; c < cells; c += 1) {
    const n = c + 1;
    const at = (dx: number, dy: number) => ({ x: 200 * c + dx, y: dy });
    b.components.push(
      { id: `s${n}`, type: 'pushbutton-no', tag: `S${n}`, position: at(0, 500), parameters: {} },
      { id: `k${n}`, type: 'relay-coil', tag: `K${n}`, position: at(0, 600), parameters: {} },
      { id: `kc${n}`, type: 'relay-contact-no', tag: `K${n}.1`, position: at(60, 500), parameters: { coil: `K${n}` } },
      { id: `m${n}`, type: 'solenoid-coil', tag: `${n}M1`, position: at(60, 600), parameters: { valve: `${n}V1`, side: '14' } },
      { id: `v${n}`, type: 'valve-5-2', tag: `${n}V1`, position: at(0, 200), parameters: { actuation: 'solenoid', returnBy: 'spring' } },
    );
    b.tube(`s${n}`, 'supply', '2', `v${n}`, '1', 1);
    b.cylinder(n, at);
    b.wire(`e${n}a`, 'g1', 'L+', `s${n}`, '13');
    b.wire(`e${n}b`, `s${n}`, '14', `k${n}`, 'A1');
    b.wire(`e${n}c`, `k${n}`, 'A2', 'g1', 'M');
    b.wire(`e${n}d`, 'g1', 'L+', `kc${n}`, '13');
    b.wire(`e${n}e`, `kc${n}`, '14', `m${n}`, 'A1');
    b.wire(`e${n}f`, `m${n}`, 'A2', 'g1', 'M');
    b.presses(c, `s${n}`);
  }
  return b.build();
}
