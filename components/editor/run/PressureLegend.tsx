import { rampColour } from './pressure-ramp';

/** The key to the drawing during a run: tube colours in bar gauge, and live wires when the drawing has wires. */
export function PressureLegend({ topBar, wires }: { topBar: number; wires: boolean }) {
  const stops = Array.from({ length: 11 }, (_, i) => `${rampColour(i / 10)} ${i * 10}%`).join(', ');
  return (
    <figure className="pointer-events-none absolute bottom-3 left-3 z-10 rounded-md border border-rule bg-paper-raised/90 px-2 py-1.5 text-xs text-ink-soft shadow-sm" data-testid="pressure-legend">
      <figcaption className="mb-1 font-medium text-ink">Pressure, bar (gauge)</figcaption>
      <div className="h-2.5 w-40 rounded-sm" style={{ background: `linear-gradient(to right, ${stops})` }} />
      <div className="value mt-0.5 flex justify-between">
        <span>0</span>
        <span>{(topBar / 2).toFixed(topBar % 2 ? 1 : 0)}</span>
        <span>{topBar}</span>
      </div>
      {wires ? (
        <div className="mt-1.5 flex items-center gap-3" data-testid="wire-legend">
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
