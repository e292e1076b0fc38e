import { AdjustArrow } from './AdjustArrow';
import { CheckPassage } from './CheckPassage';
import type { DirectionalValveSymbolProps } from './DirectionalValveSymbol';
import { TIMER_ROOM } from './geometry';
import { restrictionPath } from './shapes';
import { SymbolBody } from './SymbolBody';
import { ValveBody } from './ValveBody';
import { AXIS_Y, valveLayout } from './valve-layout';

const PILOT_DASH = '3 2';

/**
 * A pneumatic timer: control air on the side-a pilot port fills a small reservoir through an
 * adjustable throttle, and the reservoir's pressure switches a 3/2 valve; a check valve
 * across the throttle empties the reservoir at once when the control air goes.
 */
export function TimeDelayValveSymbol({ positions, pilotPorts, actuation, returnBy, activePosition, tag, showPortNumbers }: Omit<DirectionalValveSymbolProps, 'adjustableReturn'>) {
  const layout = valveLayout({ positions, pilotPorts }, TIMER_ROOM);
  const y = AXIS_Y;
  return (
    <SymbolBody anchors={layout.anchors} tag={tag} showPortNumbers={showPortNumbers}>
      <g data-part="timer">
        <path d={`M0 ${y} H10 M38 ${y} H${TIMER_ROOM}`} strokeDasharray={PILOT_DASH} />
        <path d={`M10 ${y} H38 M14 ${y} V${y - 14} M34 ${y} V${y - 14} M42 ${y} V${y + 8}`} />
        <path d={restrictionPath(24, y, 'horizontal', 12, 5)} />
        <AdjustArrow x1={17} y1={y + 9} x2={31} y2={y - 9} />
        <CheckPassage x1={34} y1={y - 14} x2={14} y2={y - 14} radius={3.5} />
        <rect x={36} y={y + 8} width={12} height={14} rx={4} />
      </g>
      <ValveBody layout={layout} positions={positions} actuation={actuation} returnBy={returnBy} activePosition={activePosition} />
    </SymbolBody>
  );
}
