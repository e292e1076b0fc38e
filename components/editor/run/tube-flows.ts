import type { CircuitDocument } from '@/engine/document/schema';
import type { SolverModel } from '@/engine/solver/model';

/** A trace column and the sign that turns its flow into flow leaving a part through one port. */
export type SignedColumn = readonly [column: number, sign: 1 | -1];

/**
 * Which flow columns make up the air flowing along each tube, from its first end towards its
 * second: the passages of the part at the first end that open onto that port, counted positive
 * when they run towards it; or, where that part has none (an ideal supply holds its port without
 * one), the passages of the part at the second end, counted the other way. The engine keeps no
 * flow per tube (a tube adds volume to the port it joins), so this is the flow a part passes
 * into or takes from the line.
 */
export function tubeFlowColumns(document: CircuitDocument, model: Pick<SolverModel, 'portNodes' | 'restrictions'>, names: readonly string[]): Record<string, SignedColumn[]> {
  const nodeOf = new Map(model.portNodes.map((p) => [p.signal, p.node]));
  const columnOf = new Map(names.map((name, i) => [name, i]));
  /** Passages of a part onto one of its ports, positive when they run towards the port. */
  const onto = (component: string, port: string, towards: 1 | -1): SignedColumn[] => {
    const node = nodeOf.get(`${component}:p:${port}`);
    if (node === undefined) return [];
    const columns: SignedColumn[] = [];
    for (const r of model.restrictions) {
      if (r.owner !== component || (r.to !== node && r.from !== node) || r.to === r.from) continue;
      const column = columnOf.get(`${r.owner}:q:${r.name}`);
      if (column !== undefined) columns.push([column, r.to === node ? towards : (-towards as 1 | -1)]);
    }
    return columns;
  };
  const out: Record<string, SignedColumn[]> = {};
  for (const tube of document.tubes) {
    const first = onto(tube.from.component, tube.from.port, 1);
    out[tube.id] = first.length ? first : onto(tube.to.component, tube.to.port, -1);
  }
  return out;
}
