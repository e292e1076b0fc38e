import { ChangeoverContact } from './ChangeoverContact';
import { ContactOperator } from './ContactOperator';
import { symbolGeometry } from './geometry';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

const geometry = symbolGeometry('limit-switch');

/** Limit switch: a changeover contact worked by a roller that a cam on the moving part rides over. */
export function LimitSwitchSymbol({ actuated = false, tag, showPortNumbers }: SymbolProps & { actuated?: boolean }) {
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <ContactOperator kind="roller" x={16} y={30} />
      <ChangeoverContact x={40} actuated={actuated} linkFrom={16} />
    </SymbolBody>
  );
}
