import { symbolGeometry } from './geometry';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

export interface ProximitySensorSymbolProps extends SymbolProps {
  /** What the sensor senses: a piston magnet through the barrel, or steel in front of its face. */
  sensing: 'magnetic' | 'inductive';
  /** The output BK is switched to BN. */
  detecting?: boolean;
}

/**
 * Three-wire proximity sensor: its body with the proximity mark (a rhombus) and the sensing
 * principle beside it, + lead BN above, output BK and 0 V lead BU below.
 */
export function ProximitySensorSymbol({ sensing, detecting = false, tag, showPortNumbers }: ProximitySensorSymbolProps) {
  const geometry = symbolGeometry(sensing === 'magnetic' ? 'proximity-sensor-reed' : 'proximity-sensor-inductive');
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <path d="M30 0 V14 M20 46 V60 M40 46 V60" />
      <rect x={14} y={14} width={32} height={32} />
      <path
        data-part="sensing"
        data-detecting={detecting}
        d="M24 23 L31 30 L24 37 L17 30 Z"
        fill={detecting ? 'currentColor' : 'none'}
        fillOpacity={detecting ? 0.35 : undefined}
      />
      {sensing === 'magnetic' ? <path d="M33 28 H40 M36 32 H43" /> : <path d="M33 31 q1.5 -4 3 0 q1.5 -4 3 0 q1.5 -4 3 0" />}
    </SymbolBody>
  );
}
