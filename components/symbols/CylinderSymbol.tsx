import { AdjustArrow } from './AdjustArrow';
import { symbolGeometry } from './geometry';
import { springPath } from './shapes';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

export interface CylinderSymbolProps extends SymbolProps {
  /** Single-acting: air on A extends, a spring in the rod chamber retracts. */
  acting: 'single' | 'double';
  /** A rod out of both ends. */
  throughRod?: boolean;
  /** End-position cushioning with adjustable needles. */
  cushioned?: boolean;
  /** Piston travel as a share of the stroke (0 retracted, 1 extended); a run moves piston and rod by it. */
  extension?: number;
}

/** How far the drawn piston travels inside the barrel for a full stroke. */
const DRAWN_STROKE = 76;

/**
 * Linear cylinder, drawn retracted as ISO 1219-1 draws it at rest: barrel, piston, rod, the
 * cap-end port A and the rod-end port B below.
 */
export function CylinderSymbol({ acting, throughRod = false, cushioned = false, extension = 0, tag, showPortNumbers }: CylinderSymbolProps) {
  const geometry = symbolGeometry(acting === 'single' ? 'cylinder-single-acting' : 'cylinder-double-acting');
  const travel = Math.min(1, Math.max(0, extension)) * DRAWN_STROKE;
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <rect x={20} y={10} width={100} height={30} />
      <g data-part="moving" transform={travel ? `translate(${travel} 0)` : undefined}>
        <rect data-part="piston" x={32} y={10} width={4} height={30} fill="currentColor" />
        <rect x={36} y={23} width={114} height={4} />
        {throughRod ? <rect data-part="second-rod" x={6} y={23} width={26} height={4} /> : null}
      </g>
      <path d={acting === 'single' ? 'M30 40 V50' : 'M30 40 V50 M110 40 V50'} />
      {acting === 'single' ? <path data-part="spring" d={springPath(37, 119, 25, 11, 9)} /> : null}
      {cushioned ? (
        <g data-part="cushions">
          <rect x={26} y={20} width={6} height={10} />
          <rect x={36} y={20} width={6} height={10} />
          <AdjustArrow x1={14} y1={36} x2={27} y2={14} />
          <AdjustArrow x1={113} y1={36} x2={126} y2={14} />
        </g>
      ) : null}
    </SymbolBody>
  );
}
