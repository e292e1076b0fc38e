import { AdjustArrow } from './AdjustArrow';
import { CheckPassage } from './CheckPassage';
import { symbolGeometry } from './geometry';
import { restrictionPath } from './shapes';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

const geometry = symbolGeometry('one-way-flow-control');

/** One-way flow control valve: an adjustable throttle with a check valve beside it, free from 1 to 2. */
export function OneWayFlowControlSymbol({ tag, showPortNumbers }: SymbolProps) {
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <path d="M40 0 V12 M40 70 V58 M22 12 H58 M22 58 H58 M22 12 V58" />
      <circle cx={40} cy={12} r={1.6} fill="currentColor" />
      <circle cx={40} cy={58} r={1.6} fill="currentColor" />
      <path d={restrictionPath(22, 35, 'vertical')} />
      <AdjustArrow x1={11} y1={48} x2={33} y2={21} />
      <CheckPassage x1={58} y1={58} x2={58} y2={12} radius={5.5} />
    </SymbolBody>
  );
}
