import { symbolGeometry } from './geometry';
import { SymbolBody } from './SymbolBody';
import { energisedFill, type SymbolProps } from './symbol-props';

const geometry = symbolGeometry('indicator-lamp');

/** Indicator lamp (IEC 60617): a circle with a cross, filled while lit. */
export function IndicatorLampSymbol({ energised = false, tag, showPortNumbers }: SymbolProps & { energised?: boolean }) {
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <path d="M30 0 V20 M30 40 V60" />
      <circle data-part="lamp" data-energised={energised} cx={30} cy={30} r={10} {...energisedFill(energised)} />
      <path d="M22.93 22.93 L37.07 37.07 M37.07 22.93 L22.93 37.07" />
    </SymbolBody>
  );
}
