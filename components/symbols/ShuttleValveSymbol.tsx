import { symbolGeometry } from './geometry';
import { LOGIC_INPUT_NUMBERS, LogicValveBody, SeatedBall } from './LogicValveBody';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

const geometry = symbolGeometry('shuttle-valve');

/** Shuttle valve (OR): the ball is pushed onto the seat of the weaker input, so the stronger one feeds 2. */
export function ShuttleValveSymbol({ joined = '1.1', tag, showPortNumbers }: SymbolProps & { joined?: '1.1' | '1.2' }) {
  return (
    <SymbolBody anchors={geometry.ports} numbers={LOGIC_INPUT_NUMBERS} tag={tag} showPortNumbers={showPortNumbers}>
      <LogicValveBody>
        <SeatedBall closes={joined === '1.1' ? 'right' : 'left'} />
      </LogicValveBody>
    </SymbolBody>
  );
}
