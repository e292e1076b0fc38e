import { symbolGeometry } from './geometry';
import { Note } from './Note';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

const geometry = symbolGeometry('dc-supply');

/** DC control supply as IEC 60617 draws a source: the long plate is +, the short one 0 V. */
export function DcSupplySymbol({ voltage, tag, showPortNumbers }: SymbolProps & { voltage?: number }) {
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <path d="M30 0 V27 M20 27 H40 M30 33 V60" />
      <path d="M24 33 H36" strokeWidth={3} />
      {voltage !== undefined ? (
        <Note x={58} y={47} anchor="end">
          {`${voltage} V`}
        </Note>
      ) : null}
    </SymbolBody>
  );
}
