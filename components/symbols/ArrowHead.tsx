import { arrowHeadPoints } from './shapes';

/** A filled arrowhead with its tip at (toX, toY), pointing along the line from (fromX, fromY). */
export function ArrowHead({ fromX, fromY, toX, toY, size = 5 }: { fromX: number; fromY: number; toX: number; toY: number; size?: number }) {
  return <polygon points={arrowHeadPoints(fromX, fromY, toX, toY, size, size * 0.42)} fill="currentColor" stroke="none" />;
}
