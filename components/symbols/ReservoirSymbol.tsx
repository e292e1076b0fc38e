import { symbolGeometry } from './geometry';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

const geometry = symbolGeometry('reservoir');

/** Air reservoir (receiver): a vessel with rounded ends. */
export function ReservoirSymbol({ tag, showPortNumbers }: SymbolProps) {
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <rect x={10} y={12} width={60} height={24} rx={12} />
      <path d="M40 36 V50" />
    </SymbolBody>
  );
}
