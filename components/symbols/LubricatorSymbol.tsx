import { symbolGeometry } from './geometry';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

const geometry = symbolGeometry('lubricator');

/** Lubricator: the conditioning-unit diamond with a falling drop of oil inside. */
export function LubricatorSymbol({ tag, showPortNumbers }: SymbolProps) {
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <path d="M30 0 V14 M30 46 V60 M30 14 L46 30 L30 46 L14 30 Z" />
      <path d="M30 19 V25" />
      <path d="M30 28 L27.5 33 A2.5 2.5 0 0 0 32.5 33 Z" fill="currentColor" />
    </SymbolBody>
  );
}
