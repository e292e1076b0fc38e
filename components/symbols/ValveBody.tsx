import { ArrowHead } from './ArrowHead';
import { pointBefore } from './shapes';
import { ValveEndMark } from './ValveEndMark';
import { AXIS_Y, bodyShift, ENVELOPE, ENVELOPE_BOTTOM, ENVELOPE_TOP, type ValveLayout, type ValvePositionShape } from './valve-layout';

/** Length of a blocked port's stem into the envelope, and half its cross bar. */
const BLOCK_STEM = 8;
const BLOCK_BAR = 4;
const PILOT_DASH = '3 2';

/**
 * Which marks stand at each end. Two positions: the actuation at side a, the return at side b.
 * Three positions: the valve is worked from both sides, so both ends carry the actuation, and
 * the centring (springs) or holding (detent) beside it.
 */
function endMarks(actuation: string, returnBy: string, positionCount: number): { left: string[]; right: string[] } {
  const handleHasDetent = actuation === 'lever-detent' || actuation === 'selector-detent';
  const returnMark = returnBy === 'detent' && handleHasDetent ? null : returnBy;
  if (positionCount === 3) {
    const both = returnMark && returnMark !== actuation ? [actuation, returnMark] : [actuation];
    return { left: both, right: both };
  }
  return { left: [actuation], right: returnMark ? [returnMark] : [] };
}

/** Centre lines of the marks at one end: on the axis alone, stacked above and below it in pairs. */
const markRows = (count: number) => (count === 1 ? [AXIS_Y] : [AXIS_Y - 10, AXIS_Y + 10]);

const portY = (edge: 'top' | 'bottom') => (edge === 'top' ? ENVELOPE_TOP : ENVELOPE_BOTTOM);

function Envelope({ layout, position, x }: { layout: ValveLayout; position: ValvePositionShape; x: number }) {
  const joined = new Set(position.passages.flat());
  return (
    <g data-part="envelope" data-position={position.name}>
      <rect x={x} y={ENVELOPE_TOP} width={ENVELOPE} height={ENVELOPE} />
      {position.passages.map(([from, to]) => {
        const x1 = x + layout.column[from]!;
        const x2 = x + layout.column[to]!;
        const y1 = portY(layout.edge[from]!);
        const y2 = portY(layout.edge[to]!);
        // Two ports on one edge are joined by a path that dips into the envelope and back.
        const sameEdge = y1 === y2;
        const turnY = y1 === ENVELOPE_TOP ? ENVELOPE_TOP + 14 : ENVELOPE_BOTTOM - 14;
        const fromX = sameEdge ? x2 : x1;
        const fromY = sameEdge ? turnY : y1;
        const end = pointBefore(fromX, fromY, x2, y2, 4);
        const d = sameEdge ? `M${x1} ${y1} V${turnY} H${x2} V${end.y}` : `M${x1} ${y1} L${end.x} ${end.y}`;
        return (
          <g key={`${from}-${to}`} data-passage={`${from}-${to}`}>
            <path d={d} />
            <ArrowHead fromX={fromX} fromY={fromY} toX={x2} toY={y2} />
          </g>
        );
      })}
      {layout.flowPorts
        .filter((port) => !joined.has(port))
        .map((port) => {
          const px = x + layout.column[port]!;
          const edgeY = portY(layout.edge[port]!);
          const stemY = edgeY === ENVELOPE_TOP ? edgeY + BLOCK_STEM : edgeY - BLOCK_STEM;
          return <path key={port} data-blocked={port} d={`M${px} ${edgeY} V${stemY} M${px - BLOCK_BAR} ${stemY} H${px + BLOCK_BAR}`} />;
        })}
    </g>
  );
}

export interface ValveBodyProps {
  layout: ValveLayout;
  positions: ReadonlyArray<ValvePositionShape>;
  actuation: string;
  returnBy: string;
  activePosition?: number;
  /** Marks the return spring adjustable (a pressure sequence valve's switching pressure). */
  adjustableReturn?: boolean;
}

/**
 * The drawn directional control valve: port lines fixed to the anchors, and the body (the
 * envelopes with their end marks) moved so that the active position meets the port lines.
 */
export function ValveBody({ layout, positions, actuation, returnBy, activePosition, adjustableReturn = false }: ValveBodyProps) {
  const dx = bodyShift(layout, activePosition);
  const marks = endMarks(actuation, returnBy, positions.length);
  const leftEdge = layout.envelopeX[0]!;
  const rightEdge = layout.envelopeX[layout.envelopeX.length - 1]! + ENVELOPE;

  // A pilot line runs from its port to the body wherever the body now stands, unless the body covers the port.
  const leads = [
    ...markRows(marks.left.length).flatMap((y, i) =>
      marks.left[i] === 'pilot' && layout.bodyLeft + dx > layout.leadLeft ? [`M${layout.leadLeft} ${AXIS_Y} H${layout.bodyLeft + dx} V${y}`] : [],
    ),
    ...markRows(marks.right.length).flatMap((y, i) =>
      marks.right[i] === 'pilot' && layout.bodyRight + dx < layout.leadRight ? [`M${layout.leadRight} ${AXIS_Y} H${layout.bodyRight + dx} V${y}`] : [],
    ),
  ];

  return (
    <g>
      {layout.flowPorts.map((port) => {
        const anchor = layout.anchors[port]!;
        return <line key={port} x1={anchor.x} y1={anchor.y} x2={anchor.x} y2={portY(layout.edge[port]!)} />;
      })}
      {leads.map((d) => (
        <path key={d} d={d} strokeDasharray={PILOT_DASH} />
      ))}
      <g data-part="valve-body" transform={`translate(${dx} 0)`}>
        {positions.map((position, i) => (
          <Envelope key={position.name} layout={layout} position={position} x={layout.envelopeX[i]!} />
        ))}
        {marks.left.map((kind, i) => (
          <ValveEndMark key={`left-${kind}`} kind={kind} x={leftEdge} y={markRows(marks.left.length)[i]!} end="left" />
        ))}
        {marks.right.map((kind, i) => (
          <ValveEndMark key={`right-${kind}`} kind={kind} x={rightEdge} y={markRows(marks.right.length)[i]!} end="right" adjustable={adjustableReturn && kind === 'spring'} />
        ))}
      </g>
    </g>
  );
}
