import { ChangeoverContact } from './ChangeoverContact';
import { ContactOperator } from './ContactOperator';
import { symbolGeometry } from './geometry';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

const geometry = symbolGeometry('pressure-switch');

/** Pressure switch: the air on port 1 works a changeover contact once it passes the setting. */
export function PressureSwitchSymbol({ actuated = false, tag, showPortNumbers }: SymbolProps & { actuated?: boolean }) {
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <path d="M0 30 H8" />
      <ContactOperator kind="pressure" x={20} y={30} />
      <ChangeoverContact x={50} actuated={actuated} linkFrom={20} />
    </SymbolBody>
  );
}
