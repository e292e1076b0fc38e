'use client';

import '@xyflow/react/dist/style.css';
import { Background, BackgroundVariant, ConnectionMode, Controls, ReactFlow, ReactFlowProvider } from '@xyflow/react';
import { useMemo } from 'react';
import { CANVAS_EDGE_TYPES, CANVAS_NODE_TYPES } from '@/components/editor/canvas-types';
import { edgesOf, nodesOf, type ChangeMark, type ComponentFlowNode, type ConnectionFlowEdge } from '@/components/editor/flow-mapping';
import { rampTopBar } from '@/components/editor/run/pressure-ramp';
import { edgeInRun } from '@/components/editor/run/run-edges';
import { RunContext, type RunView } from '@/components/editor/run/run-context';
import type { RunFrame } from '@/components/editor/run/run-frame';
import type { CircuitDocument } from '@/engine/document/schema';
import type { CommentAnchor } from './review-api';
import { countOf } from '@/components/ui/count';

const NOTHING = { components: [], tubes: [], wires: [] };

/** Stroke of a tube or wire by how it changed, in the same key as the parts. */
const EDGE_MARK: Record<ChangeMark, { stroke: string; strokeWidth: number; strokeDasharray?: string; opacity?: number }> = {
  added: { stroke: '#0f766e', strokeWidth: 3 },
  changed: { stroke: '#b45309', strokeWidth: 3 },
  removed: { stroke: '#3b4754', strokeWidth: 2, strokeDasharray: '2 4', opacity: 0.5 },
};

export interface DrawingMarks {
  components: ReadonlyMap<string, ChangeMark>;
  tubes: ReadonlyMap<string, ChangeMark>;
  wires: ReadonlyMap<string, ChangeMark>;
}

interface RevisionDrawingProps {
  /** The revision shown. */
  document: CircuitDocument;
  /** What was removed since the revision compared with, drawn faded where it stood. */
  removed?: CircuitDocument;
  marks?: DrawingMarks;
  /** Comment threads per part or tube id. */
  comments?: ReadonlyMap<string, number>;
  /** The item a new comment would be pinned to. */
  picked?: CommentAnchor;
  onPick?: (anchor: CommentAnchor) => void;
  /** A moment of a saved run to show on the drawing. */
  frame?: RunFrame | null;
}

/**
 * A revision drawn read-only: for a comparison with its changes marked, for a review with the
 * comment markers and the part or tube a comment will be pinned to, and for a saved run with its
 * state at one moment.
 */
export function RevisionDrawing(props: RevisionDrawingProps) {
  return (
    <ReactFlowProvider>
      <Drawing {...props} />
    </ReactFlowProvider>
  );
}

function Drawing({ document, removed, marks, comments, picked, onPick, frame }: RevisionDrawingProps) {
  const selection = useMemo(
    () => ({
      components: picked?.kind === 'component' ? [picked.componentId] : [],
      tubes: picked?.kind === 'tube' ? [picked.tubeId] : [],
      wires: [],
    }),
    [picked],
  );
  const nodes = useMemo<ComponentFlowNode[]>(() => {
    const shown = nodesOf(document, selection).map((n) => ({
      ...n,
      data: { ...n.data, mark: marks?.components.get(n.id), comments: comments?.get(n.id) },
    }));
    const ghosts = removed ? nodesOf(removed, NOTHING).map((n) => ({ ...n, data: { ...n.data, mark: 'removed' as const }, selectable: false })) : [];
    return [...ghosts, ...shown];
  }, [comments, document, marks, removed, selection]);
  const edges = useMemo<ConnectionFlowEdge[]>(() => {
    const topBar = rampTopBar(frame?.highestBar ?? 0);
    const shown = edgesOf(document, selection).map((e) => {
      // A replay shows the run's colours; the change marks return when it is closed.
      if (frame) return edgeInRun(e, frame, topBar);
      const mark = e.data?.kind === 'wire' ? marks?.wires.get(e.id) : marks?.tubes.get(e.id);
      const threads = comments?.get(e.id);
      const label = threads ? countOf(threads, 'comment') : undefined;
      return mark ? { ...e, style: EDGE_MARK[mark], label } : label ? { ...e, label } : e;
    });
    const ghosts = removed ? edgesOf(removed, NOTHING).map((e) => ({ ...e, style: EDGE_MARK.removed, selectable: false })) : [];
    return [...ghosts, ...shown];
  }, [comments, document, frame, marks, removed, selection]);
  const run = useMemo<RunView>(
    () => ({ running: frame !== null && frame !== undefined, states: frame?.components ?? new Map(), portBar: frame?.portBar ?? new Map(), portFlow: frame?.portFlow ?? new Map(), actuate: () => {} }),
    [frame],
  );

  return (
    <div className="airproof-canvas relative h-full w-full" data-testid="revision-drawing">
      <RunContext.Provider value={run}>
        <ReactFlow<ComponentFlowNode, ConnectionFlowEdge>
          nodes={nodes}
          edges={edges}
          nodeTypes={CANVAS_NODE_TYPES}
          edgeTypes={CANVAS_EDGE_TYPES}
          // Every port is a source handle (air has no set direction), so tubes must be found in loose mode.
          connectionMode={ConnectionMode.Loose}
          nodesDraggable={false}
          nodesConnectable={false}
          elementsSelectable={Boolean(onPick)}
          onNodeClick={onPick ? (_, node) => node.data.mark !== 'removed' && onPick({ kind: 'component', componentId: node.id }) : undefined}
          onEdgeClick={onPick ? (_, edge) => edge.data?.kind === 'tube' && document.tubes.some((t) => t.id === edge.id) && onPick({ kind: 'tube', tubeId: edge.id }) : undefined}
          fitView
          fitViewOptions={{ padding: 0.15, maxZoom: 1.5 }}
          minZoom={0.2}
          maxZoom={4}
          panOnScroll
          proOptions={{ hideAttribution: true }}
        >
          <Background variant={BackgroundVariant.Dots} gap={20} size={1} />
          <Controls showInteractive={false} position="bottom-right" />
        </ReactFlow>
      </RunContext.Provider>
    </div>
  );
}
