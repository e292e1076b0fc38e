import { CheckPassage } from './CheckPassage';
import { symbolGeometry } from './geometry';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

const geometry = symbolGeometry('check-valve');

/** Check valve: free flow from 1 (below) to 2 (above), closed the other way. */
export function CheckValveSymbol({ tag, showPortNumbers }: SymbolProps) {
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <CheckPassage x1={20} y1={60} x2={20} y2={0} radius={5.5} />
    </SymbolBody>
  );
}
