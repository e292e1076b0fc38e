import { symbolGeometry } from './geometry';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

const geometry = symbolGeometry('air-supply');

/** Compressed-air source: a circle with a triangle pointing to its outlet, hollow as ISO 1219-1 draws a pneumatic source (filled would mean hydraulic). */
export function AirSupplySymbol({ tag, showPortNumbers }: SymbolProps) {
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <path d="M30 0 V20" />
      <circle cx={30} cy={32} r={12} />
      <path d="M30 25 L24.5 35 H35.5 Z" />
    </SymbolBody>
  );
}
