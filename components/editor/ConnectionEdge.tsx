'use client';

import { BaseEdge, EdgeLabelRenderer, useReactFlow, type EdgeProps } from '@xyflow/react';
import { memo, useContext, useEffect, useRef, useState, type MouseEvent, type PointerEvent as ReactPointerEvent } from 'react';
import { setBends } from './document-commands';
import { EdgeEditingContext } from './edge-context';
import type { ConnectionFlowEdge } from './flow-mapping';
import {
  addBend,
  innerSegments,
  midpointOf,
  moveBend,
  moveSegment,
  orthogonalRoute,
  pathOf,
  removeBend,
  stubEnd,
  type Point,
  type RouteEnds,
} from './orthogonal-route';

const NO_BENDS: readonly Point[] = [];

/** Radius of a junction dot: a little wider than the line it sits on. */
const DOT_RADIUS = { tube: 3.5, wire: 2.5 } as const;

const HANDLE = 'nodrag nopan absolute left-0 top-0 size-2 rounded-[1px] border';

/**
 * A tube or wire, drawn square along its route through the document's bends, with the junction
 * dot of a tee it starts. Selected on an editable canvas it shows a handle on every bend and in
 * the middle of every run that may move; a drag shows the new route here and becomes one undo
 * step when the pointer is let go.
 */
export const ConnectionEdge = memo(function ConnectionEdge({
  id,
  data,
  selected,
  sourceX,
  sourceY,
  sourcePosition,
  targetX,
  targetY,
  targetPosition,
  style,
  label,
  labelStyle,
  labelShowBg,
  labelBgStyle,
  labelBgPadding,
  labelBgBorderRadius,
  interactionWidth,
}: EdgeProps<ConnectionFlowEdge>) {
  const store = useContext(EdgeEditingContext);
  const flow = useReactFlow();
  const [preview, setPreview] = useState<readonly Point[] | null>(null);
  const abandonDrag = useRef<(() => void) | null>(null);
  useEffect(() => () => abandonDrag.current?.(), []);

  const kind = data?.kind ?? 'tube';
  const bends = preview ?? data?.bends ?? NO_BENDS;
  const ends: RouteEnds = { source: { x: sourceX, y: sourceY, side: sourcePosition }, target: { x: targetX, y: targetY, side: targetPosition } };
  const route = orthogonalRoute(ends, bends);
  const middle = midpointOf(route);

  const commit = (label: string, next: readonly Point[]) => store?.getState().edit(label, (d) => setBends(d, kind, id, next));
  const pointAt = (event: { clientX: number; clientY: number }) => flow.screenToFlowPosition({ x: event.clientX, y: event.clientY }, { snapToGrid: false });

  // Listening on the window keeps the drag alive when the grabbed handle is redrawn or the pointer outruns it.
  const startDrag = (event: ReactPointerEvent, label: string, reshape: (at: Point) => readonly Point[]) => {
    if (event.button !== 0) return;
    event.stopPropagation();
    let latest: readonly Point[] | null = null;
    const move = (e: PointerEvent) => {
      latest = reshape(pointAt(e));
      setPreview(latest);
    };
    const finish = (keep: boolean) => {
      window.removeEventListener('pointermove', move);
      window.removeEventListener('pointerup', release);
      window.removeEventListener('pointercancel', abandon);
      abandonDrag.current = null;
      if (keep && latest) commit(label, latest);
      setPreview(null);
    };
    const release = () => finish(true);
    const abandon = () => finish(false);
    window.addEventListener('pointermove', move);
    window.addEventListener('pointerup', release);
    window.addEventListener('pointercancel', abandon);
    abandonDrag.current = abandon;
  };

  const handleAt = (at: Point) => ({ transform: `translate(-50%, -50%) translate(${at.x}px, ${at.y}px)`, pointerEvents: 'all' as const });
  const quiet = (event: MouseEvent) => event.stopPropagation();

  return (
    <>
      <g
        onDoubleClick={
          store
            ? (event) => {
                event.stopPropagation();
                commit('Add bend', addBend(ends, bends, pointAt(event)));
              }
            : undefined
        }
      >
        <BaseEdge
          id={id}
          path={pathOf(route)}
          style={style}
          interactionWidth={interactionWidth}
          label={label}
          labelX={middle.x}
          labelY={middle.y}
          labelStyle={labelStyle}
          labelShowBg={labelShowBg}
          labelBgStyle={labelBgStyle}
          labelBgPadding={labelBgPadding}
          labelBgBorderRadius={labelBgBorderRadius}
        />
      </g>
      {(data?.dots ?? []).map((end) => {
        const at = stubEnd(end === 'source' ? ends.source : ends.target);
        return <circle key={end} className="airproof-junction" cx={at.x} cy={at.y} r={DOT_RADIUS[kind]} style={style?.stroke ? { fill: style.stroke } : undefined} />;
      })}
      {store && selected ? (
        <EdgeLabelRenderer>
          {innerSegments(route).map((run) => (
            <div
              key={`run-${run.index}`}
              className={`${HANDLE} border-accent bg-paper-raised ${run.horizontal ? 'cursor-row-resize' : 'cursor-col-resize'}`}
              style={handleAt(run.middle)}
              title="Drag to move this run"
              data-testid="run-handle"
              onPointerDown={(event) => startDrag(event, 'Move run', (at) => moveSegment(ends, bends, run.index, at))}
              onClick={quiet}
              onDoubleClick={quiet}
            />
          ))}
          {bends.map((bend, index) => (
            <div
              key={`bend-${index}`}
              className={`${HANDLE} cursor-move border-paper-raised bg-accent`}
              style={handleAt(bend)}
              title="Drag to move this bend; double-click to remove it"
              data-testid="bend-handle"
              onPointerDown={(event) => startDrag(event, 'Move bend', (at) => moveBend(bends, index, at))}
              onClick={quiet}
              onDoubleClick={(event) => {
                event.stopPropagation();
                commit('Remove bend', removeBend(bends, index));
              }}
            />
          ))}
        </EdgeLabelRenderer>
      ) : null}
    </>
  );
});
