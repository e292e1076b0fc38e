import type { ReactNode } from 'react';
import type { PortAnchor } from './geometry';

/** Where a port number sits beside its anchor, by the box edge the anchor lies on. */
function numberPlace(anchor: PortAnchor): { x: number; y: number; textAnchor: 'start' | 'end' } {
  switch (anchor.side) {
    case 'top':
      return { x: anchor.x + 2.5, y: anchor.y + 7.5, textAnchor: 'start' };
    case 'bottom':
      return { x: anchor.x + 2.5, y: anchor.y - 2.5, textAnchor: 'start' };
    case 'left':
      return { x: anchor.x + 2, y: anchor.y - 4, textAnchor: 'start' };
    case 'right':
      return { x: anchor.x - 2, y: anchor.y - 4, textAnchor: 'end' };
  }
}

export interface SymbolBodyProps {
  anchors: Readonly<Record<string, PortAnchor>>;
  /** Text drawn for a port where it is not the port id (both inputs of a logic valve read 1). */
  numbers?: Readonly<Record<string, string>>;
  tag?: string;
  /** Start of the tag's baseline; the top left corner unless the drawing needs it elsewhere. */
  tagAt?: { x: number; y: number };
  showPortNumbers?: boolean;
  children: ReactNode;
}

/**
 * The frame every symbol shares: line work in the current colour with no fill, so the
 * canvas themes and colours a symbol through CSS `color`, and the tag and port numbers
 * in the monospace face the rest of the product uses for designations.
 */
export function SymbolBody({ anchors, numbers = {}, tag, tagAt = { x: 2, y: 8 }, showPortNumbers = true, children }: SymbolBodyProps) {
  return (
    <g>
      <g fill="none" stroke="currentColor" strokeWidth={1.5} strokeLinecap="round" strokeLinejoin="round">
        {children}
      </g>
      <g fill="currentColor" stroke="none" className="font-mono">
        {tag ? (
          <text data-part="tag" x={tagAt.x} y={tagAt.y} fontSize={8}>
            {tag}
          </text>
        ) : null}
        {showPortNumbers
          ? Object.entries(anchors).map(([port, anchor]) => {
              const place = numberPlace(anchor);
              return (
                <text key={port} data-port={port} x={place.x} y={place.y} textAnchor={place.textAnchor} fontSize={6.5} fillOpacity={0.8}>
                  {numbers[port] ?? port}
                </text>
              );
            })
          : null}
      </g>
    </g>
  );
}
