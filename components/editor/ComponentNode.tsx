'use client';

import { Handle, Position, type NodeProps } from '@xyflow/react';
import { memo } from 'react';
import { symbolGeometry } from '@/components/symbols/geometry';
import { SymbolFor } from '@/components/symbols/SymbolFor';
import { componentTypeById } from '@/engine/components/registry';
import type { ComponentFlowNode } from './flow-mapping';

const SIDE_TO_POSITION = { top: Position.Top, right: Position.Right, bottom: Position.Bottom, left: Position.Left } as const;

/** A placed component on the canvas: its symbol, and one handle per port at the symbol's anchor. */
export const ComponentNode = memo(function ComponentNode({ data, selected }: NodeProps<ComponentFlowNode>) {
  const { component } = data;
  const type = componentTypeById(component.type);
  const geometry = symbolGeometry(component.type);
  return (
    <div
      className={`relative text-ink ${selected ? 'rounded-sm outline-2 outline-offset-4 outline-accent' : ''}`}
      style={{ width: geometry.width, height: geometry.height }}
      data-testid="canvas-component"
      data-component-id={component.id}
      data-tag={component.tag}
      title={`${component.tag} · ${type?.label ?? component.type}`}
    >
      <SymbolFor typeId={component.type} parameters={component.parameters} tag={component.tag} />
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
