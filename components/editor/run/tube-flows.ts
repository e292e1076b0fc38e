import type { CircuitDocument } from '@/engine/document/schema';
import type { SolverModel } from '@/engine/solver/model';

/** A trace column and the sign that turns its flow into flow leaving a part through one port. */
export type SignedColumn = readonly [column: number, sign: 1 | -1];

/**
 * Which flow columns make up the air going into each tube at its first end: every passage of
 * the part at that end that opens onto the port, counted positive when it runs towards the port.
 * The engine keeps no flow per tube (a tube adds volume to the port it joins), so this is the
 * flow a user sees leaving the part into the line.
 */
export function tubeFlowColumns(document: CircuitDocument, model: Pick<SolverModel, 'portNodes' | 'restrictions'>, names: readonly string[]): Record<string, SignedColumn[]> {
  const nodeOf = new Map(model.portNodes.map((p) => [p.signal, p.node]));
  const columnOf = new Map(names.map((name, i) => [name, i]));
  const out: Record<string, SignedColumn[]> = {};
  for (const tube of document.tubes) {
    const { component, port } = tube.from;
    const node = nodeOf.get(`${component}:p:${port}`);
    const columns: SignedColumn[] = [];
    if (node !== undefined) {
      for (const r of model.restrictions) {
        if (r.owner !== component || (r.to !== node && r.from !== node) || r.to === r.from) continue;
        const column = columnOf.get(`${r.owner}:q:${r.name}`);
        if (column !== undefined) columns.push([column, r.to === node ? 1 : -1]);
      }
    }
    out[tube.id] = columns;
  }
  return out;
}
