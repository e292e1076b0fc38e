import type { CircuitComponent } from '@/engine/document/schema';
import { symbolGeometry, type PortAnchor, type PortSide, type SymbolGeometry } from './geometry';

/**
 * A placed component's symbol: the type's geometry mirrored first (about the box's vertical
 * centre line, so left and right change places), then turned clockwise on screen about the box
 * in quarter turns. The placed box keeps its top left corner at 0,0; a quarter or three-quarter
 * turn swaps its width and height. Box sizes and anchors are multiples of 10, so placed anchors
 * stay on the 10-unit grid.
 */

export type Placement = Pick<CircuitComponent, 'rotation' | 'mirrored'>;
export type Rotation = Placement['rotation'];

const CLOCKWISE: Readonly<Record<PortSide, PortSide>> = { top: 'right', right: 'bottom', bottom: 'left', left: 'top' };
const MIRRORED: Readonly<Record<PortSide, PortSide>> = { top: 'top', right: 'left', bottom: 'bottom', left: 'right' };

interface Size {
  readonly width: number;
  readonly height: number;
}

/** The box a symbol of this size takes once placed. */
function placedSize(size: Size, { rotation }: Placement): Size {
  return rotation === 90 || rotation === 270 ? { width: size.height, height: size.width } : { width: size.width, height: size.height };
}

/** Where a point or port anchor of the unplaced symbol (in a box of `size`) lies in the placed box. */
export function placeAnchor(anchor: PortAnchor, size: Size, { rotation, mirrored }: Placement): PortAnchor {
  let { x, y, side } = anchor;
  if (mirrored) {
    x = size.width - x;
    side = MIRRORED[side];
  }
  // Each quarter turn moves the point into a box whose width is the previous height.
  let height = size.height;
  let width = size.width;
  for (let turn = 0; turn < rotation / 90; turn += 1) {
    [x, y] = [height - y, x];
    [width, height] = [height, width];
    side = CLOCKWISE[side];
  }
  return { x, y, side };
}

/** The box and port anchors of a component type's symbol as placed (see `symbolGeometry` for `portIds`). */
export function placedGeometry(typeId: string, placement: Placement, portIds: readonly string[] = []): SymbolGeometry {
  const geometry = symbolGeometry(typeId, portIds);
  if (placement.rotation === 0 && !placement.mirrored) return geometry;
  return {
    ...placedSize(geometry, placement),
    ports: Object.fromEntries(Object.entries(geometry.ports).map(([port, anchor]) => [port, placeAnchor(anchor, geometry, placement)])),
  };
}

/**
 * The CSS transform that draws the unplaced symbol (a box of `size` at 0,0) into its placed box,
 * to be applied with `transform-origin: 0 0`: mirrored, turned, then moved so that the symbol's
 * own top left corner lands where `placeAnchor` puts it.
 */
export function placementTransform(size: Size, placement: Placement): string {
  const corner = placeAnchor({ x: 0, y: 0, side: 'top' }, size, placement);
  return `translate(${corner.x}px, ${corner.y}px) rotate(${placement.rotation}deg)${placement.mirrored ? ' scaleX(-1)' : ''}`;
}
