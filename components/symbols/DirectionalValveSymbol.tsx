import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';
import { ValveBody } from './ValveBody';
import { valveLayout, type ValvePositionShape } from './valve-layout';

export interface DirectionalValveSymbolProps extends SymbolProps {
  /** The switching positions in the type's order: the port pairs each joins. */
  positions: ReadonlyArray<ValvePositionShape>;
  /** Pilot or actuation ports of side a (drawn left) and side b (drawn right). */
  pilotPorts: readonly [string, string];
  /** One of the valve's actuations (push-button, lever, pilot, solenoid …). */
  actuation: string;
  /** What returns the valve at side b: spring, pilot, solenoid or detent. */
  returnBy: string;
  /** Index into `positions` of the position the valve is in; the rest position when left out. */
  activePosition?: number;
  adjustableReturn?: boolean;
}

/** Any directional control valve, 2/2 to 5/3, drawn from its positions per ISO 1219-1. */
export function DirectionalValveSymbol({ positions, pilotPorts, actuation, returnBy, activePosition, adjustableReturn, tag, showPortNumbers }: DirectionalValveSymbolProps) {
  const layout = valveLayout({ positions, pilotPorts });
  return (
    <SymbolBody anchors={layout.anchors} tag={tag} showPortNumbers={showPortNumbers}>
      <ValveBody layout={layout} positions={positions} actuation={actuation} returnBy={returnBy} activePosition={activePosition} adjustableReturn={adjustableReturn} />
    </SymbolBody>
  );
}
