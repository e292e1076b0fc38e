import { circuitDocumentSchema, type CircuitDocument } from '@/engine/document/schema';

type Parameters = Record<string, number | string | boolean>;

/** A tiny builder for test circuits: components by id, tubes by "id:port" pairs. */
export class TestCircuit {
  private readonly components: Array<{ id: string; type: string; tag: string; parameters: Parameters }> = [];
  private readonly tubes: Array<{ from: string; to: string; lengthM: number; innerDiameterM: number }> = [];
  private readonly links: Array<{ from: string; to: string; positionM: number }> = [];
  private readonly wires: Array<{ from: string; to: string }> = [];

  add(id: string, type: string, parameters: Parameters = {}, tag = id): this {
    this.components.push({ id, type, tag, parameters });
    return this;
  }

  /** A tube of 4 mm bore (common practice for 6 mm outside-diameter tubing). */
  tube(from: string, to: string, lengthM = 0.5, innerDiameterM = 0.004): this {
    this.tubes.push({ from, to, lengthM, innerDiameterM });
    return this;
  }

  /** A wire between two electrical terminals, "id:terminal" each. */
  wire(from: string, to: string): this {
    this.wires.push({ from, to });
    return this;
  }

  link(cylinder: string, valve: string, positionM: number): this {
    this.links.push({ from: cylinder, to: valve, positionM });
    return this;
  }

  build(): CircuitDocument {
    const ref = (s: string) => {
      const [component, port] = s.split(':');
      return { component: component!, port: port! };
    };
    return circuitDocumentSchema.parse({
      schemaVersion: 1,
      components: this.components.map((c, i) => ({ ...c, position: { x: i * 100, y: 0 } })),
      tubes: this.tubes.map((t, i) => ({ id: `t${i}`, from: ref(t.from), to: ref(t.to), lengthM: t.lengthM, innerDiameterM: t.innerDiameterM })),
      wires: this.wires.map((w, i) => ({ id: `w${i}`, from: ref(w.from), to: ref(w.to) })),
      links: this.links.map((l, i) => ({ id: `l${i}`, kind: 'actuation', from: l.from, to: l.to, positionM: l.positionM })),
    });
  }
}
