import type { Edge, Node } from '@xyflow/react';
import { symbolGeometry } from '@/components/symbols/geometry';
import type { CircuitComponent, CircuitDocument } from '@/engine/document/schema';
import type { Severity } from './diagnostics';
import type { ItemSelection } from './document-commands';

export type ComponentNodeData = { component: CircuitComponent; problem?: Severity };
export type ComponentFlowNode = Node<ComponentNodeData, 'component'>;
export type ConnectionEdgeData = { kind: 'tube' | 'wire' };
export type ConnectionFlowEdge = Edge<ConnectionEdgeData>;

/**
 * The canvas is a view of the document: one node per component (sized by its symbol, so the
 * canvas needs no measuring pass) and one edge per tube or wire, between the ports' handles.
 */
export function nodesOf(document: CircuitDocument, selection: ItemSelection, problems: ReadonlyMap<string, Severity> = new Map()): ComponentFlowNode[] {
  const selected = new Set(selection.components);
  return document.components.map((component) => {
    const geometry = symbolGeometry(component.type);
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
  const marked = (base: string, id: string) => (problems.has(id) ? `${base} airproof-${problems.get(id)}` : base);
  const tubes = new Set(selection.tubes);
  const wires = new Set(selection.wires);
  return [
    ...document.tubes.map((t) => ({
      id: t.id,
      source: t.from.component,
      sourceHandle: t.from.port,
      target: t.to.component,
      targetHandle: t.to.port,
      type: 'smoothstep',
      className: marked('airproof-tube', t.id),
      selected: tubes.has(t.id),
      data: { kind: 'tube' as const },
    })),
    ...document.wires.map((w) => ({
      id: w.id,
      source: w.from.component,
      sourceHandle: w.from.port,
      target: w.to.component,
      targetHandle: w.to.port,
      type: 'step',
      className: marked('airproof-wire', w.id),
      selected: wires.has(w.id),
      data: { kind: 'wire' as const },
    })),
  ];
}
