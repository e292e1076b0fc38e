'use client';

import { Handle, Position, type NodeProps } from '@xyflow/react';
import { memo, useContext } from 'react';
import { symbolGeometry } from '@/components/symbols/geometry';
import { SymbolFor } from '@/components/symbols/SymbolFor';
import { componentTypeById } from '@/engine/components/registry';
import type { ComponentFlowNode } from './flow-mapping';
import { RunContext } from './run/run-context';
import { handOperationOf } from './run/hands';

const SIDE_TO_POSITION = { top: Position.Top, right: Position.Right, bottom: Position.Bottom, left: Position.Left } as const;

/** A placed component on the canvas: its symbol, and one handle per port at the symbol's anchor. */
export const ComponentNode = memo(function ComponentNode({ data, selected }: NodeProps<ComponentFlowNode>) {
  const { component, problem } = data;
  const type = componentTypeById(component.type);
  const geometry = symbolGeometry(component.type);
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
      className={`relative text-ink ${workable ? 'cursor-pointer ' : ''}${selected ? 'rounded-sm outline-2 outline-offset-4 outline-accent' : problem ? `rounded-sm outline-2 outline-offset-4 outline-dashed ${problem === 'error' ? 'outline-danger' : 'outline-caution'}` : ''}`}
      style={{ width: geometry.width, height: geometry.height }}
      data-testid="canvas-component"
      data-component-id={component.id}
      data-tag={component.tag}
      data-problem={problem}
      title={`${component.tag} · ${type?.label ?? component.type}`}
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
      {(type?.ports ?? []).map((port) => {
        const anchor = geometry.ports[port.id];
        if (!anchor) return null;
        return (
          <Handle
            key={port.id}
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
