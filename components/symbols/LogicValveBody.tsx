import type { ReactNode } from 'react';
import { round } from './shapes';

/**
 * The body shared by the two-pressure, shuttle and quick exhaust valves: a horizontal bore
 * with an inlet at each end, brought down to the ports below, and the outlet on top.
 */
export function LogicValveBody({ children }: { children: ReactNode }) {
  return (
    <>
      <path d="M10 50 V24 H20 M70 50 V24 H60 M40 16 V0" />
      <rect x={20} y={16} width={40} height={16} />
      {children}
    </>
  );
}

/** ISO 5599-3 numbers both inputs of a logic valve 1. */
export const LOGIC_INPUT_NUMBERS = { '1.1': '1', '1.2': '1' } as const;

const BALL = 5;
/** From a seat's point to the ball's centre, so the ball touches both sides (they rise 7 over 5). */
const SEAT_REACH = BALL / Math.sin(Math.atan2(7, 5));

/** A ball between two seats at the ends of the bore; it closes the end named by `closes`. */
export function SeatedBall({ closes }: { closes: 'left' | 'right' }) {
  const cx = round(closes === 'left' ? 21 + SEAT_REACH : 59 - SEAT_REACH);
  return (
    <g data-part="ball" data-closes={closes}>
      <path d="M26 17 L21 24 L26 31 M54 17 L59 24 L54 31" />
      <circle cx={cx} cy={24} r={BALL} />
    </g>
  );
}
