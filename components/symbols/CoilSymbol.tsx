import { symbolGeometry } from './geometry';
import { SymbolBody } from './SymbolBody';
import { energisedFill, type SymbolProps } from './symbol-props';

export interface CoilSymbolProps extends SymbolProps {
  /** Timer relays: contacts delayed after energising (on) or after de-energising (off). */
  delay?: 'on' | 'off';
  /** A valve's solenoid rather than a relay's coil. */
  solenoid?: boolean;
  energised?: boolean;
}

/**
 * An operating coil in a current path (IEC 60617): a rectangle between A1 and A2. A timer
 * relay carries a side box with its delay mark (crossed for on-delay, solid for off-delay);
 * a valve solenoid is struck through as on the valve it drives.
 */
export function CoilSymbol({ delay, solenoid = false, energised = false, tag, showPortNumbers }: CoilSymbolProps) {
  const geometry = symbolGeometry(solenoid ? 'solenoid-coil' : 'relay-coil');
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <path d="M30 0 V20 M30 40 V60" />
      <rect data-part="coil" data-energised={energised} x={18} y={20} width={24} height={20} {...energisedFill(energised)} />
      {solenoid ? <path d="M18 40 L42 20" /> : null}
      {delay === 'on' ? <path data-delay="on" d="M8 20 H18 V40 H8 Z M8 20 L18 40 M18 20 L8 40" /> : null}
      {delay === 'off' ? <rect data-delay="off" x={8} y={20} width={10} height={20} fill="currentColor" /> : null}
    </SymbolBody>
  );
}
