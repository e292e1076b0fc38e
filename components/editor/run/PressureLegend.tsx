import { rampColour } from './pressure-ramp';

/**
 * The key to the drawing during a run: tube colours in bar gauge, and live wires when the drawing
 * has wires. A band under the drawing rather than over a corner of it, where it would hide parts.
 */
export function PressureLegend({ topBar, wires }: { topBar: number; wires: boolean }) {
  const stops = Array.from({ length: 11 }, (_, i) => `${rampColour(i / 10)} ${i * 10}%`).join(', ');
  return (
    <figure className="flex flex-wrap items-center gap-x-4 gap-y-1 border-t border-rule px-3 py-1 text-xs text-ink-soft" data-testid="pressure-legend">
      <figcaption className="font-medium text-ink">Pressure, bar (gauge)</figcaption>
      <div className="w-40">
        <div className="h-2.5 rounded-sm" style={{ background: `linear-gradient(to right, ${stops})` }} />
        <div className="value mt-0.5 flex justify-between">
          <span>0</span>
          <span>{(topBar / 2).toFixed(topBar % 2 ? 1 : 0)}</span>
          <span>{topBar}</span>
        </div>
      </div>
      {wires ? (
        <div className="flex items-center gap-3" data-testid="wire-legend">
          <span className="flex items-center gap-1">
            <svg width="22" height="6" aria-hidden="true">
              <line x1="0" y1="3" x2="22" y2="3" stroke="#b45309" strokeWidth="3" />
            </svg>
            live wire
          </span>
          <span className="flex items-center gap-1">
            <svg width="22" height="6" aria-hidden="true">
              <line x1="0" y1="3" x2="22" y2="3" stroke="#5b4bb7" strokeWidth="1.25" strokeDasharray="5 4" />
            </svg>
            no voltage
          </span>
        </div>
      ) : null}
    </figure>
  );
}
