import { ArrowHead } from './ArrowHead';
import { symbolGeometry } from './geometry';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

const geometry = symbolGeometry('semi-rotary-actuator');

/** Semi-rotary actuator: a rotary drive whose two-headed arc marks a limited swivel both ways. */
export function SemiRotaryActuatorSymbol({ tag, showPortNumbers }: SymbolProps) {
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <circle cx={40} cy={22} r={14} />
      <path d="M30 50 V31.8 M50 50 V31.8 M54 22 H68 M68 18 V26" />
      <path d="M34.34 16.34 A8 8 0 0 1 45.66 16.34" />
      <ArrowHead fromX={35.05} fromY={15.63} toX={32.22} toY={18.46} size={4} />
      <ArrowHead fromX={44.95} fromY={15.63} toX={47.78} toY={18.46} size={4} />
    </SymbolBody>
  );
}
