import { round as r } from './shapes';

/** Half-angle of the seat's V, degrees. */
const SEAT_HALF_ANGLE = (40 * Math.PI) / 180;

/**
 * A check valve as ISO 1219-1 draws it, on a straight line from (x1, y1) to (x2, y2): a ball
 * resting in a V-shaped seat. Flow from the first point lifts the ball off the seat (free
 * flow); flow the other way presses it in. The ball and seat sit in the middle of the line.
 */
export function CheckPassage({ x1, y1, x2, y2, radius = 5 }: { x1: number; y1: number; x2: number; y2: number; radius?: number }) {
  const length = Math.hypot(x2 - x1, y2 - y1) || 1;
  const ux = (x2 - x1) / length;
  const uy = (y2 - y1) / length;
  // The ball touches both arms of the V when its centre is this far from the V's point.
  const reach = radius / Math.sin(SEAT_HALF_ANGLE);
  const start = (length - reach - radius) / 2;
  const vx = x1 + ux * start;
  const vy = y1 + uy * start;
  const cx = vx + ux * reach;
  const cy = vy + uy * reach;
  const arm = reach + radius * 0.6;
  const cos = Math.cos(SEAT_HALF_ANGLE);
  const sin = Math.sin(SEAT_HALF_ANGLE);
  const armEnd = (sign: number) => `${r(vx + arm * (ux * cos - sign * uy * sin))} ${r(vy + arm * (uy * cos + sign * ux * sin))}`;
  return (
    <g data-part="check">
      <path d={`M${r(x1)} ${r(y1)} L${r(vx)} ${r(vy)} M${armEnd(1)} L${r(vx)} ${r(vy)} L${armEnd(-1)}`} />
      <circle cx={r(cx)} cy={r(cy)} r={radius} />
      <line x1={r(cx + ux * radius)} y1={r(cy + uy * radius)} x2={x2} y2={y2} />
    </g>
  );
}
