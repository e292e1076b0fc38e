import { symbolGeometry } from './geometry';
import { LOGIC_INPUT_NUMBERS, LogicValveBody } from './LogicValveBody';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

const geometry = symbolGeometry('two-pressure-valve');

/** How far the spool stands off centre when one disc closes its seat. */
const SPOOL_TRAVEL = 4;

/**
 * Two-pressure valve (AND): a spool with a disc at each end; the stronger input pushes the
 * spool across until its own disc closes its seat, so only the weaker input reaches 2.
 */
export function TwoPressureValveSymbol({ joined = '1.1', tag, showPortNumbers }: SymbolProps & { joined?: '1.1' | '1.2' }) {
  const shift = joined === '1.1' ? -SPOOL_TRAVEL : SPOOL_TRAVEL;
  const leftDisc = 28 + shift;
  const rightDisc = 52 + shift;
  return (
    <SymbolBody anchors={geometry.ports} numbers={LOGIC_INPUT_NUMBERS} tag={tag} showPortNumbers={showPortNumbers}>
      <LogicValveBody>
        <path d="M32 16 V20 M32 32 V28 M48 16 V20 M48 32 V28" />
        <path data-part="spool" d={`M${leftDisc} 19 V29 M${rightDisc} 19 V29 M${leftDisc} 24 H${rightDisc}`} />
      </LogicValveBody>
    </SymbolBody>
  );
}
