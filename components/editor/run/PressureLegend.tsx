import { rampColour } from './pressure-ramp';

/** The key to the tube colours during a run, in bar gauge. */
export function PressureLegend({ topBar }: { topBar: number }) {
  const stops = Array.from({ length: 11 }, (_, i) => `${rampColour(i / 10)} ${i * 10}%`).join(', ');
  return (
    <figure className="pointer-events-none absolute left-3 top-3 z-10 rounded-md border border-rule bg-paper-raised/90 px-2 py-1.5 text-xs text-ink-soft shadow-sm" data-testid="pressure-legend">
      <figcaption className="mb-1 font-medium text-ink">Pressure, bar (gauge)</figcaption>
      <div className="h-2.5 w-40 rounded-sm" style={{ background: `linear-gradient(to right, ${stops})` }} />
      <div className="value mt-0.5 flex justify-between">
        <span>0</span>
        <span>{(topBar / 2).toFixed(topBar % 2 ? 1 : 0)}</span>
        <span>{topBar}</span>
      </div>
    </figure>
  );
}
