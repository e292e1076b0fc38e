import { symbolGeometry } from './geometry';
import { Note } from './Note';
import { SymbolBody } from './SymbolBody';
import { energisedFill, type SymbolProps } from './symbol-props';

const geometry = symbolGeometry('counter');

/** Preset counter: a counting coil A1–A2 that adds one per pulse and a reset coil R1–R2. */
export function CounterSymbol({ energised = false, tag, showPortNumbers }: SymbolProps & { energised?: boolean }) {
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <path d="M20 0 V20 M20 40 V60 M60 0 V20 M60 40 V60" />
      <rect data-part="coil" data-energised={energised} x={8} y={20} width={24} height={20} {...energisedFill(energised)} />
      <rect x={48} y={20} width={24} height={20} />
      <Note x={20} y={32.5}>
        +1
      </Note>
      <Note x={60} y={32.5}>
        R
      </Note>
    </SymbolBody>
  );
}
