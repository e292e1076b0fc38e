import { AdjustArrow } from './AdjustArrow';
import { springPath } from './shapes';

/** Small notches under the rod: the mechanism that holds a valve where it was put. */
const NOTCHES = 'M-3 4 l-2 -3 l-2 3 l-2 -3 l-2 3';

/**
 * Each mark drawn in its own frame: the envelope edge at x = 0, the mark reaching outwards
 * to x = -20, centred on y = 0. The marks follow ISO 1219-1's meanings; the shapes are ours.
 */
function markFor(kind: string, adjustable: boolean) {
  switch (kind) {
    case 'pushbutton':
      return <path d="M0 0 H-12 M-15 -6 H-12 V6 H-15" />;
    case 'mushroom':
      return <path d="M0 0 H-11 M-11 -8 A8 8 0 0 0 -11 8 Z" />;
    case 'lever-detent':
      return <path d={`M0 0 H-9 M-5 5 L-17 -8 ${NOTCHES}`} />;
    case 'selector-detent':
      return (
        <>
          <path d={`M0 0 H-10 M-18.5 3 L-11.5 -3 ${NOTCHES}`} />
          <circle cx={-15} cy={0} r={4.5} />
        </>
      );
    case 'roller':
      return (
        <>
          <path d="M0 0 H-12" />
          <circle cx={-16} cy={0} r={4} />
        </>
      );
    case 'one-way-roller':
      // The roller sits on a hinged arm, so a cam passing the other way folds it without moving the spool.
      return (
        <>
          <path d="M0 0 H-8 L-12 -4" />
          <circle cx={-8} cy={0} r={1.5} fill="currentColor" />
          <circle cx={-14.5} cy={-6.5} r={3.5} />
        </>
      );
    case 'pilot':
      return (
        <>
          <path d="M-20 0 H-10" strokeDasharray="3 2" />
          <rect x={-10} y={-6} width={10} height={12} />
          <path d="M-2 0 L-8 -4 V4 Z" />
        </>
      );
    case 'solenoid':
      return <path d="M0 -7 H-12 V7 H0 M-12 7 L0 -7" />;
    case 'spring':
      return (
        <>
          <path d={springPath(0, -19, 0, 6, 5)} />
          {adjustable ? <AdjustArrow x1={-18} y1={8} x2={-2} y2={-9} /> : null}
        </>
      );
    case 'detent':
      return <path d={`M0 0 H-14 M-8 -1 V-7 M-10.5 -7 H-5.5 ${NOTCHES}`} />;
    default:
      return null;
  }
}

/**
 * An actuation or return mark at one end of a valve body. `x` is the envelope edge it
 * stands on; marks at the right end are drawn mirrored.
 */
export function ValveEndMark({ kind, x, y, end, adjustable = false }: { kind: string; x: number; y: number; end: 'left' | 'right'; adjustable?: boolean }) {
  return (
    <g data-mark={kind} transform={`translate(${x} ${y})${end === 'right' ? ' scale(-1 1)' : ''}`}>
      {markFor(kind, adjustable)}
    </g>
  );
}
