import type { ReactNode } from 'react';

/** A few characters of text inside a drawing (a counter's +1, a supply's voltage). */
export function Note({ x, y, anchor = 'middle', children }: { x: number; y: number; anchor?: 'start' | 'middle' | 'end'; children: ReactNode }) {
  return (
    <text x={x} y={y} textAnchor={anchor} fontSize={6.5} fill="currentColor" stroke="none" className="font-mono">
      {children}
    </text>
  );
}
