import { AdjustArrow } from './AdjustArrow';
import { ArrowHead } from './ArrowHead';
import { symbolGeometry } from './geometry';
import { springPath } from './shapes';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

const geometry = symbolGeometry('pressure-regulator');

/**
 * Relieving pressure regulator: a normally open passage 1→2 throttled by a spool that the
 * outlet pressure (fed back as a pilot line) pushes against an adjustable spring; the relief
 * path to 3 opens when the outlet is above the setting.
 */
export function PressureRegulatorSymbol({ tag, showPortNumbers }: SymbolProps) {
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} tagAt={{ x: 50, y: 8 }} showPortNumbers={showPortNumbers}>
      <path d="M30 0 V10 M30 50 V60 M50 50 V60" />
      <rect x={20} y={10} width={40} height={40} />
      <path d="M30 50 V15" />
      <ArrowHead fromX={30} fromY={50} toX={30} toY={10} />
      <path d="M50 50 V42 M46 42 H54" />
      <path d="M30 5 H10 V30 H20" strokeDasharray="3 2" />
      <circle cx={30} cy={5} r={1.5} fill="currentColor" />
      <path d={springPath(60, 78, 30, 6, 5)} />
      <AdjustArrow x1={61} y1={39} x2={77} y2={20} />
    </SymbolBody>
  );
}
