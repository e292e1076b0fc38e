/**
 * Path data for the small shapes that recur across symbols. Pure functions of their
 * coordinates, so a symbol can place the same spring or restriction anywhere.
 */

/** Two decimals are plenty at canvas scale and keep the markup short. */
export const round = (value: number) => Math.round(value * 100) / 100;

/** Points of an arrowhead whose tip is at (tipX, tipY), pointing away from (fromX, fromY). */
export function arrowHeadPoints(fromX: number, fromY: number, tipX: number, tipY: number, length = 5, halfWidth = 2): string {
  const dx = tipX - fromX;
  const dy = tipY - fromY;
  const norm = Math.hypot(dx, dy) || 1;
  const ux = dx / norm;
  const uy = dy / norm;
  const baseX = tipX - ux * length;
  const baseY = tipY - uy * length;
  const corners = [
    [tipX, tipY],
    [baseX - uy * halfWidth, baseY + ux * halfWidth],
    [baseX + uy * halfWidth, baseY - ux * halfWidth],
  ];
  return corners.map(([x, y]) => `${round(x!)},${round(y!)}`).join(' ');
}

/** A zig-zag spring along a horizontal line from x0 to x1 with `peaks` points either side. */
export function springPath(x0: number, x1: number, y: number, amplitude: number, peaks: number): string {
  const step = (x1 - x0) / (peaks + 1);
  const points = Array.from({ length: peaks }, (_, i) => `L${round(x0 + step * (i + 1))} ${round(y + (i % 2 === 0 ? -amplitude : amplitude))}`);
  return `M${round(x0)} ${round(y)} ${points.join(' ')} L${round(x1)} ${round(y)}`;
}

/**
 * A restriction: two arcs either side of a flow line through (cx, cy), bowed towards it,
 * `span` long along the line.
 */
export function restrictionPath(cx: number, cy: number, along: 'vertical' | 'horizontal', span = 20, gap = 6): string {
  const h = span / 2;
  if (along === 'vertical') {
    return `M${cx - gap} ${cy - h} Q${cx - 1} ${cy} ${cx - gap} ${cy + h} M${cx + gap} ${cy - h} Q${cx + 1} ${cy} ${cx + gap} ${cy + h}`;
  }
  return `M${cx - h} ${cy - gap} Q${cx} ${cy - 1} ${cx + h} ${cy - gap} M${cx - h} ${cy + gap} Q${cx} ${cy + 1} ${cx + h} ${cy + gap}`;
}

/** The point `distance` short of (toX, toY) on the line from (fromX, fromY): where a line meets its arrowhead. */
export function pointBefore(fromX: number, fromY: number, toX: number, toY: number, distance: number): { x: number; y: number } {
  const norm = Math.hypot(toX - fromX, toY - fromY) || 1;
  return { x: round(toX - ((toX - fromX) / norm) * distance), y: round(toY - ((toY - fromY) / norm) * distance) };
}
