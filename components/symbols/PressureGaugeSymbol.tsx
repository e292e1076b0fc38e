import { ArrowHead } from './ArrowHead';
import { symbolGeometry } from './geometry';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

const geometry = symbolGeometry('pressure-gauge');

/** Pressure gauge: a dial with a pointer, on its sensing port. */
export function PressureGaugeSymbol({ tag, showPortNumbers }: SymbolProps) {
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <circle cx={30} cy={20} r={12} />
      <path d="M30 32 V50 M23 27 L33.5 16.5" />
      <ArrowHead fromX={23} fromY={27} toX={37} toY={13} size={4.5} />
    </SymbolBody>
  );
}
