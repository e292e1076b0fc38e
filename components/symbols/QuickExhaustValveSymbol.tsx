import { symbolGeometry } from './geometry';
import { LogicValveBody, SeatedBall } from './LogicValveBody';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

const geometry = symbolGeometry('quick-exhaust-valve');

/**
 * Quick exhaust valve: supply 1 lifts the disc off its seat and fills 2 while the disc
 * closes the exhaust 3; when 1 falls the disc closes 1 and 2 blows straight out of 3.
 */
export function QuickExhaustValveSymbol({ exhausting = false, tag, showPortNumbers }: SymbolProps & { exhausting?: boolean }) {
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <LogicValveBody>
        <SeatedBall closes={exhausting ? 'left' : 'right'} />
      </LogicValveBody>
      <path d="M66 38 H74 L70 44 Z" />
    </SymbolBody>
  );
}
