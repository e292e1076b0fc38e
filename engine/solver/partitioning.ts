import type { RuntimeApi } from '../components/types';
import type { SolverModel } from './model';
import type { PartitionSpec } from './partition';

class Sets {
  private readonly parent: Int32Array;
  constructor(size: number) {
    this.parent = Int32Array.from({ length: size }, (_, i) => i);
  }
  find(a: number): number {
    let r = a;
    while (this.parent[r] !== r) r = this.parent[r]!;
    this.parent[a] = r;
    return r;
  }
  union(a: number, b: number): void {
    const ra = this.find(a);
    const rb = this.find(b);
    if (ra !== rb) this.parent[Math.max(ra, rb)] = Math.min(ra, rb);
  }
}

/**
 * Splits a model into partitions that can be integrated independently: free
 * nodes joined by passages, with the pistons of their chambers and every
 * behaviour whose guards read them. Which nodes and pistons a behaviour's guards
 * read is found by calling them once through a recording api.
 */
export function buildPartitions(model: SolverModel, api: RuntimeApi): PartitionSpec[] {
  const nodeCount = model.nodes.length;
  const pistonElement = (k: number) => nodeCount + k;
  const sets = new Sets(nodeCount + model.pistons.length);
  const free = (node: number) => !model.nodes[node]!.fixed;

  for (const r of model.restrictions) {
    if (free(r.from) && free(r.to)) sets.union(r.from, r.to);
    if (r.modulator && free(r.modulator.control)) sets.union(r.modulator.control, free(r.from) ? r.from : r.to);
  }
  model.pistons.forEach((p, k) => {
    sets.union(pistonElement(k), p.capNode);
    if (p.rodNode !== null) sets.union(pistonElement(k), p.rodNode);
  });

  const boundaryReads = model.behaviours.map(() => new Set<number>());
  const readsOf = model.behaviours.map((entry, b) => {
    const read: number[] = [];
    const probe: RuntimeApi = {
      time: 0,
      pressure: (ref) => {
        if (free(ref.node)) read.push(ref.node);
        else boundaryReads[b]!.add(ref.node);
        return api.pressure(ref);
      },
      ambientPa: () => api.ambientPa(),
      position: (ref) => {
        read.push(pistonElement(ref.piston));
        return api.position(ref);
      },
      velocity: (ref) => {
        read.push(pistonElement(ref.piston));
        return api.velocity(ref);
      },
      setOpening: () => undefined,
      setFixedPressure: () => undefined,
      schedule: () => undefined,
      cancel: () => undefined,
      event: () => undefined,
      send: () => undefined,
    };
    entry.behaviour.guards?.(probe);
    for (const element of read) sets.union(element, read[0]!);
    return read;
  });

  const byRoot = new Map<number, PartitionSpec>();
  const specOf = (element: number): PartitionSpec => {
    const root = sets.find(element);
    let spec = byRoot.get(root);
    if (!spec) {
      spec = { freeNodes: [], fixedNodes: [], restrictions: [], pistons: [], behaviours: [], watchedBoundaries: [] };
      byRoot.set(root, spec);
    }
    return spec;
  };
  for (let node = 0; node < nodeCount; node += 1) if (free(node)) specOf(node).freeNodes.push(node);
  model.pistons.forEach((_, k) => specOf(pistonElement(k)).pistons.push(k));
  model.restrictions.forEach((r, index) => {
    const anchor = free(r.from) ? r.from : free(r.to) ? r.to : -1;
    if (anchor < 0) return;
    const spec = specOf(anchor);
    spec.restrictions.push(index);
    for (const end of [r.from, r.to]) if (!free(end) && !spec.fixedNodes.includes(end)) spec.fixedNodes.push(end);
  });
  // Guards that read only boundary pressures change only when a boundary does: they get a partition without state.
  const boundary: PartitionSpec = { freeNodes: [], fixedNodes: [], restrictions: [], pistons: [], behaviours: [], watchedBoundaries: [] };
  readsOf.forEach((read, b) => {
    const spec = read.length ? specOf(read[0]!) : model.behaviours[b]!.behaviour.guards ? boundary : null;
    if (!spec) return;
    spec.behaviours.push(b);
    for (const node of boundaryReads[b]!) if (!spec.watchedBoundaries.includes(node)) spec.watchedBoundaries.push(node);
  });
  const specs = [...byRoot.entries()].sort((a, b) => a[0] - b[0]).map(([, spec]) => spec);
  return boundary.behaviours.length ? [...specs, boundary] : specs;
}
