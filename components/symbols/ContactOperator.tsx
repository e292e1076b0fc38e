export type ContactOperatorKind = 'pushbutton' | 'mushroom' | 'selector' | 'roller' | 'pressure';

/** Linkage between an operator and the blade it moves: dashed, as IEC 60617 draws a mechanical link. */
export const LINKAGE_DASH = '2.5 2';

/**
 * Each operator in its own frame: the linkage leaves at x = 0, the operator reaching left to
 * x = -12, centred on y = 0. Meanings after IEC 60617; the shapes are ours.
 */
function operatorFor(kind: ContactOperatorKind) {
  switch (kind) {
    case 'pushbutton':
      return <path d="M0 0 H-4 M-8 -6 H-4 V6 H-8" />;
    case 'mushroom':
      return <path d="M0 0 H-5 M-5 -7 A7 7 0 0 0 -5 7 Z" />;
    case 'selector':
      return <path d="M0 0 H-5 V-6 H-10 M-5 0 V6" />;
    case 'roller':
      return (
        <>
          <path d="M0 0 H-4" />
          <circle cx={-8} cy={0} r={4} />
        </>
      );
    case 'pressure':
      return (
        <>
          <rect x={-12} y={-6} width={12} height={12} />
          <path d="M-2 0 L-9 -4 V4 Z" />
        </>
      );
  }
}

/** The hand, cam or pressure that works a contact, drawn ending at (x, y) where its linkage starts. */
export function ContactOperator({ kind, x, y }: { kind: ContactOperatorKind; x: number; y: number }) {
  return (
    <g data-operator={kind} transform={`translate(${x} ${y})`}>
      {operatorFor(kind)}
    </g>
  );
}

/** A notch on the linkage: the operator stays where it was put until worked again. */
export function LatchMark({ x, y }: { x: number; y: number }) {
  return <path data-part="latch" d={`M${x} ${y} l3 -4 l3 4`} />;
}
