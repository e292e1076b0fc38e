import type { CircuitDocument } from '@/engine/document/schema';
import type { SolverModel } from '@/engine/solver/model';

/** A trace column and the sign that turns its flow into the flow wanted (out of a part, or along a tube). */
export type SignedColumn = readonly [column: number, sign: 1 | -1];

/** The flow columns that sum to the air through each port (keyed `component:port`) and along each tube (keyed by its id). */
export interface FlowColumns {
  /** Air leaving the part through the port into the line; negative when it goes into the part. */
  ports: Record<string, SignedColumn[]>;
  /** Air flowing along the tube from its first end towards its second. */
  tubes: Record<string, SignedColumn[]>;
}

/**
 * The engine keeps no flow per port or tube (a tube adds volume to the node its ports join), so
 * these come from the passages: a port's flow is that of its part's passages opening onto it,
 * counted positive when they run towards it. A tube's flow is the flow out of the part at its
 * first end; where that part has no passage onto the port (an ideal supply holds its port
 * without one), the flow into the part at its second end.
 */
export function flowColumns(document: CircuitDocument, model: Pick<SolverModel, 'portNodes' | 'restrictions'>, names: readonly string[]): FlowColumns {
  const columnOf = new Map(names.map((name, i) => [name, i]));
  const ports: Record<string, SignedColumn[]> = {};
  for (const { signal, node } of model.portNodes) {
    const [component, , port] = signal.split(':');
    const columns: SignedColumn[] = [];
    for (const r of model.restrictions) {
      if (r.owner !== component || (r.to !== node && r.from !== node) || r.to === r.from) continue;
      const column = columnOf.get(`${r.owner}:q:${r.name}`);
      if (column !== undefined) columns.push([column, r.to === node ? 1 : -1]);
    }
    if (columns.length) ports[`${component}:${port}`] = columns;
  }
  const tubes: Record<string, SignedColumn[]> = {};
  for (const tube of document.tubes) {
    const first = ports[`${tube.from.component}:${tube.from.port}`];
    const second = ports[`${tube.to.component}:${tube.to.port}`];
    tubes[tube.id] = first ?? second?.map(([column, sign]): SignedColumn => [column, sign === 1 ? -1 : 1]) ?? [];
  }
  return { ports, tubes };
}
