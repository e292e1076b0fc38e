import type { Edge, Node } from '@xyflow/react';
import { placedGeometry } from '@/components/symbols/placement';
import type { CircuitComponent, CircuitDocument } from '@/engine/document/schema';
import type { Severity } from './diagnostics';
import type { ItemSelection, PortRef } from './document-commands';
import type { Point } from './orthogonal-route';

/** How a part changed between two revisions, when the drawing shows a comparison. */
export type ChangeMark = 'added' | 'changed' | 'removed';
export type ComponentNodeData = {
  component: CircuitComponent;
  problem?: Severity;
  mark?: ChangeMark;
  /** Comment threads pinned to the part, shown as a count beside it. */
  comments?: number;
};
export type ComponentFlowNode = Node<ComponentNodeData, 'component'>;
export type ConnectionEdgeData = {
  kind: 'tube' | 'wire';
  /** Canvas points the route passes through, as the document keeps them. */
  bends: readonly Point[];
  /** The ends at which this edge draws the junction dot of its port. */
  dots: ReadonlyArray<'source' | 'target'>;
};
export type ConnectionFlowEdge = Edge<ConnectionEdgeData, 'connection'>;

/**
 * The canvas is a view of the document: one node per component (sized by its symbol as turned
 * and mirrored, so the canvas needs no measuring pass) and one edge per tube or wire, between
 * the ports' handles.
 */
export function nodesOf(document: CircuitDocument, selection: ItemSelection, problems: ReadonlyMap<string, Severity> = new Map()): ComponentFlowNode[] {
  const selected = new Set(selection.components);
  return document.components.map((component) => {
    const geometry = placedGeometry(component.type, component);
    return {
      id: component.id,
      type: 'component',
      position: component.position,
      width: geometry.width,
      height: geometry.height,
      selected: selected.has(component.id),
      data: problems.has(component.id) ? { component, problem: problems.get(component.id) } : { component },
    };
  });
}

export function edgesOf(document: CircuitDocument, selection: ItemSelection, problems: ReadonlyMap<string, Severity> = new Map()): ConnectionFlowEdge[] {
  const selected = new Set([...selection.tubes, ...selection.wires]);
  const dotDrawnBy = new Map(junctionPorts(document).map((j) => [portKey(j), j.connections[0]]));
  const edgeOf = (c: Connection, kind: 'tube' | 'wire'): ConnectionFlowEdge => ({
    id: c.id,
    source: c.from.component,
    sourceHandle: c.from.port,
    target: c.to.component,
    targetHandle: c.to.port,
    type: 'connection',
    className: problems.has(c.id) ? `airproof-${kind} airproof-${problems.get(c.id)}` : `airproof-${kind}`,
    selected: selected.has(c.id),
    data: { kind, bends: c.bends, dots: (['source', 'target'] as const).filter((end) => dotDrawnBy.get(portKey(end === 'source' ? c.from : c.to)) === c.id) },
  });
  return [...document.tubes.map((t) => edgeOf(t, 'tube')), ...document.wires.map((w) => edgeOf(w, 'wire'))];
}

type Connection = CircuitDocument['tubes'][number] | CircuitDocument['wires'][number];

/** A port where two or more tubes meet, or a terminal where two or more wires do: a tee in the line. */
export interface JunctionPort extends PortRef {
  /** The tubes or wires ending there, in document order; the first draws the dot. */
  connections: string[];
}

/** Every port and terminal that is a junction, in the order the document first reaches them. */
export function junctionPorts(document: CircuitDocument): JunctionPort[] {
  const byPort = new Map<string, JunctionPort>();
  for (const c of [...document.tubes, ...document.wires]) {
    for (const end of [c.from, c.to]) {
      const at = byPort.get(portKey(end)) ?? { component: end.component, port: end.port, connections: [] };
      at.connections.push(c.id);
      byPort.set(portKey(end), at);
    }
  }
  return [...byPort.values()].filter((j) => j.connections.length >= 2);
}

const portKey = (end: PortRef) => JSON.stringify([end.component, end.port]);
