import { symbolGeometry } from './geometry';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

const geometry = symbolGeometry('filter');

/** Filter: the conditioning-unit diamond with the filter element dashed across the flow. */
export function FilterSymbol({ tag, showPortNumbers }: SymbolProps) {
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <path d="M30 0 V14 M30 46 V60 M30 14 L46 30 L30 46 L14 30 Z" />
      <path d="M15 30 H45" strokeDasharray="3 2" />
    </SymbolBody>
  );
}
