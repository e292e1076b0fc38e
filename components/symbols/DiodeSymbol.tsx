import { symbolGeometry } from './geometry';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

const geometry = symbolGeometry('diode');

/** Diode: conducts from anode A (above) to cathode K (below), the bar on the cathode side. */
export function DiodeSymbol({ tag, showPortNumbers }: SymbolProps) {
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <path d="M20 0 V24 M20 38 V60 M12 38 H28" />
      <path d="M12 24 H28 L20 38 Z" />
    </SymbolBody>
  );
}
