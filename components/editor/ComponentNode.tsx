'use client';

import { Handle, Position, useUpdateNodeInternals, type NodeProps } from '@xyflow/react';
import { memo, useContext, useEffect, useRef } from 'react';
import { symbolGeometry } from '@/components/symbols/geometry';
import { placedGeometry, placementTransform } from '@/components/symbols/placement';
import { SymbolFor } from '@/components/symbols/SymbolFor';
import { componentTypeById } from '@/engine/components/registry';
import type { ChangeMark, ComponentFlowNode } from './flow-mapping';
import { RunContext } from './run/run-context';
import { handOperationOf } from './run/hands';
import { countOf } from '@/components/ui/count';

/** Our own key for a comparison: new parts solid teal, changed ones doubled amber, removed ones faded and dotted. */
const MARK_OUTLINE: Record<ChangeMark, string> = {
  added: 'rounded-sm outline-2 outline-offset-4 outline-accent',
  changed: 'rounded-sm outline-4 outline-offset-4 outline-double outline-caution',
  removed: 'rounded-sm opacity-40 grayscale outline-2 outline-offset-4 outline-dotted outline-ink-soft',
};
const MARK_BADGE: Record<ChangeMark, { text: string; className: string }> = {
  added: { text: '+', className: 'bg-accent' },
  changed: { text: 'Δ', className: 'bg-caution' },
  removed: { text: '−', className: 'bg-ink-soft' },
};

const SIDE_TO_POSITION = { top: Position.Top, right: Position.Right, bottom: Position.Bottom, left: Position.Left } as const;

/** A placed component on the canvas: its symbol turned and mirrored as placed, and one handle per port at its placed anchor. */
export const ComponentNode = memo(function ComponentNode({ data, selected }: NodeProps<ComponentFlowNode>) {
  const { component, problem, mark, comments } = data;
  const type = componentTypeById(component.type);
  const geometry = symbolGeometry(component.type);
  const placed = placedGeometry(component.type, component);
  // The canvas measures handles again only when a node changes size, which a half turn or a flip does not.
  const updateNodeInternals = useUpdateNodeInternals();
  const placement = `${component.rotation}${component.mirrored ? ' mirrored' : ''}`;
  const measuredAs = useRef(placement);
  useEffect(() => {
    if (measuredAs.current === placement) return;
    measuredAs.current = placement;
    updateNodeInternals(component.id);
  }, [component.id, placement, updateNodeInternals]);
  const run = useContext(RunContext);
  const shown = run.running ? run.states.get(component.id) : undefined;
  const workable = run.running && handOperationOf(component) !== null;
  return (
    <div
      onPointerDown={workable ? (event) => run.actuate(component.id, 'down', event.shiftKey) : undefined}
      onPointerUp={workable ? () => run.actuate(component.id, 'up') : undefined}
      onPointerLeave={workable ? () => run.actuate(component.id, 'up') : undefined}
      data-workable={workable || undefined}
      data-extension={shown?.extension?.toFixed(3)}
      data-active-position={shown?.activePosition}
      className={`relative text-ink ${workable ? 'cursor-pointer ' : ''}${selected ? 'rounded-sm outline-2 outline-offset-4 outline-accent' : problem ? `rounded-sm outline-2 outline-offset-4 outline-dashed ${problem === 'error' ? 'outline-danger' : 'outline-caution'}` : mark ? MARK_OUTLINE[mark] : ''}`}
      data-mark={mark}
      style={{ width: placed.width, height: placed.height }}
      data-testid="canvas-component"
      data-component-id={component.id}
      data-tag={component.tag}
      data-problem={problem}
      title={[component.tag, component.label, type?.label ?? component.type].filter(Boolean).join(' · ')}
    >
      {mark ? (
        <span className={`pointer-events-none absolute -right-2 -top-2 z-10 flex size-4 items-center justify-center rounded-full text-[10px] font-bold leading-none text-paper-raised ${MARK_BADGE[mark].className}`} aria-label={mark}>
          {MARK_BADGE[mark].text}
        </span>
      ) : null}
      {comments ? (
        <span className="pointer-events-none absolute -bottom-2 -right-2 z-10 flex items-center gap-0.5 rounded-full border border-rule bg-paper-raised px-1 text-[10px] leading-4 text-ink" data-testid="comment-marker" aria-label={countOf(comments, 'comment thread')}>
          <svg width="9" height="8" viewBox="0 0 9 8" aria-hidden="true">
            <path d="M1 1h7v4.5H4L2 7V5.5H1z" fill="none" stroke="currentColor" strokeWidth="1" strokeLinejoin="round" />
          </svg>
          {comments}
        </span>
      ) : null}
      {component.label ? (
        // Above the box and upright whatever the turn, next to where the tag is usually drawn.
        <span className="pointer-events-none absolute bottom-full left-0 mb-0.5 whitespace-nowrap text-[10px] italic leading-none text-ink-soft" data-testid="canvas-label">
          {component.label}
        </span>
      ) : null}
      <div
        className="absolute top-0 left-0"
        style={{ width: geometry.width, height: geometry.height, transform: placementTransform(geometry, component), transformOrigin: '0 0' }}
      >
        <SymbolFor
          typeId={component.type}
          parameters={component.parameters}
          tag={component.tag}
          activePosition={shown?.activePosition}
          extension={shown?.extension}
          energised={shown?.energised}
          state={shown?.state}
        />
      </div>
      {(type?.ports ?? []).map((port) => {
        const anchor = placed.ports[port.id];
        if (!anchor) return null;
        const bar = run.running ? run.portBar.get(`${component.id}:${port.id}`) : undefined;
        const flow = run.running ? run.portFlow.get(`${component.id}:${port.id}`) : undefined;
        const through = flow === undefined ? '' : ` · ${Math.abs(flow).toFixed(1)} l/min (ANR) ${flow >= 0 ? 'out' : 'in'}`;
        return (
          <Handle
            key={port.id}
            title={bar === undefined ? undefined : `${component.tag} port ${port.label ?? port.id}: ${bar.toFixed(2)} bar (gauge)${through}`}
            data-bar={bar?.toFixed(3)}
            id={port.id}
            type="source"
            position={SIDE_TO_POSITION[anchor.side]}
            className={port.role === 'terminal' ? 'airproof-terminal' : 'airproof-port'}
            style={{ left: anchor.x, top: anchor.y, right: 'auto', bottom: 'auto', transform: 'translate(-50%, -50%)' }}
            data-testid="port"
            data-port={port.id}
            aria-label={`${component.tag} port ${port.label ?? port.id}`}
          />
        );
      })}
    </div>
  );
});
