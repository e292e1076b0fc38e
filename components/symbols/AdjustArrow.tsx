import { ArrowHead } from './ArrowHead';
import { pointBefore } from './shapes';

/** The slanted arrow ISO 1219-1 draws across a spring or restriction to mark it adjustable. */
export function AdjustArrow({ x1, y1, x2, y2 }: { x1: number; y1: number; x2: number; y2: number }) {
  const base = pointBefore(x1, y1, x2, y2, 3);
  return (
    <g data-part="adjustable">
      <line x1={x1} y1={y1} x2={base.x} y2={base.y} />
      <ArrowHead fromX={x1} fromY={y1} toX={x2} toY={y2} size={4.5} />
    </g>
  );
}
