import { symbolGeometry } from './geometry';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

const geometry = symbolGeometry('silencer');

/** Silencer on an exhaust port: a widening body with the air leaving it in short strokes. */
export function SilencerSymbol({ tag, showPortNumbers }: SymbolProps) {
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <path d="M20 0 V10 M16 10 H24 L30 28 H10 Z" />
      <path d="M12 32 V36 M20 32 V37 M28 32 V36" />
    </SymbolBody>
  );
}
