import type { SymbolGeometry } from './geometry';
import { Note } from './Note';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

/** Stands in for a type with no drawing (an unknown id from a newer document): a dashed box with its id. */
export function FallbackSymbol({ typeId, geometry, tag, showPortNumbers }: SymbolProps & { typeId: string; geometry: SymbolGeometry }) {
  const { width, height, ports } = geometry;
  return (
    <SymbolBody anchors={ports} tag={tag} showPortNumbers={showPortNumbers}>
      <rect x={4} y={10} width={width - 8} height={height - 20} strokeDasharray="4 3" />
      {Object.entries(ports).map(([port, anchor]) => (
        <line key={port} x1={anchor.x} y1={anchor.y} x2={anchor.x} y2={anchor.side === 'top' ? 10 : height - 10} />
      ))}
      <text x={width / 2} y={height / 2 + 2} textAnchor="middle" fontSize={14} fill="currentColor" stroke="none">
        ?
      </text>
      <Note x={width / 2} y={height - 14}>
        {typeId}
      </Note>
    </SymbolBody>
  );
}
