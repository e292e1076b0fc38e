import { AdjustArrow } from './AdjustArrow';
import { symbolGeometry } from './geometry';
import { restrictionPath } from './shapes';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

const geometry = symbolGeometry('throttle');

/** Adjustable throttle: a restriction in the line, both ways alike. */
export function ThrottleSymbol({ tag, showPortNumbers }: SymbolProps) {
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <path d="M20 0 V60" />
      <path d={restrictionPath(20, 30, 'vertical')} />
      <AdjustArrow x1={9} y1={43} x2={31} y2={16} />
    </SymbolBody>
  );
}
