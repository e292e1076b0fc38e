import { LINKAGE_DASH } from './ContactOperator';
import { round } from './shapes';

const LINK_Y = 30;

/**
 * A changeover contact (IEC 60617) with its common terminal 11 at (x, 60): at rest the blade
 * rests on the hook of 12, worked it swings over to 14. The linkage comes in from `linkFrom`.
 */
export function ChangeoverContact({ x, actuated, linkFrom }: { x: number; actuated: boolean; linkFrom: number }) {
  const tip = actuated ? { x: x + 10, y: 20 } : { x: x - 2.5, y: 18 };
  const linkX = round(x + ((tip.x - x) * (40 - LINK_Y)) / (40 - tip.y));
  return (
    <>
      <path d={`M${x - 10} 0 V20 H${x - 2} M${x + 10} 0 V20 M${x} 60 V40`} />
      <path data-part="blade" data-closed={actuated ? '14' : '12'} d={`M${x} 40 L${tip.x} ${tip.y}`} />
      <path d={`M${linkFrom} ${LINK_Y} H${linkX}`} strokeDasharray={LINKAGE_DASH} />
    </>
  );
}
