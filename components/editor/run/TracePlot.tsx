'use client';

import 'uplot/dist/uPlot.min.css';
import { useEffect, useMemo, useRef, useState } from 'react';
import uPlot from 'uplot';
import type { CircuitDocument } from '@/engine/document/schema';
import { plotSignals, runCsv, type PlotSignal } from './plot-signals';
import type { RunTrace } from './run-frame';

const COLOURS = ['#0f766e', '#b45309', '#5b4bb7', '#b42318'];
const MAX_SIGNALS = 4;
/** The plot catches up with the playback every this much machine time (redrawing each frame costs more than it shows). */
const REDRAW_EVERY_S = 0.1;

/**
 * Signals of the run against time, up to the playback time, with a read-out at the cursor.
 * Up to four signals; the first unit chosen goes on the left axis, a second on the right.
 */
export function TracePlot({ trace, document, t }: { trace: RunTrace; document: CircuitDocument; t: number }) {
  const signals = useMemo(() => plotSignals(trace, document), [trace, document]);
  const [chosen, setChosen] = useState<string[]>(() => defaultChoice(signals));
  const picked = chosen.map((name) => signals.find((s) => s.name === name)).filter((s): s is PlotSignal => s !== undefined);
  const box = useRef<HTMLDivElement>(null);
  const plot = useRef<uPlot | null>(null);
  const shownUpTo = Math.floor(t / REDRAW_EVERY_S) * REDRAW_EVERY_S;

  const units = [...new Set(picked.map((s) => s.unit))].slice(0, 2);
  const key = picked.map((s) => s.name).join('|');

  // The chart is rebuilt when the choice of signals changes, and fed new rows as the run plays.
  useEffect(() => {
    const el = box.current;
    if (!el || picked.length === 0) return;
    const options: uPlot.Options = {
      width: el.clientWidth,
      height: 180,
      // Zero stays on the axis and a flat signal still gets a sensible span (uPlot would centre it on a hair-thin range).
      scales: { x: { time: false }, ...Object.fromEntries(units.map((u) => [u, { range: (_u: uPlot, min: number, max: number): uPlot.Range.MinMax => [Math.min(0, min), Math.max(1, max)] }])) },
      axes: [
        { label: 'time, s', stroke: '#3b4754' },
        ...units.map((u, i) => ({ label: u, scale: u, side: i === 0 ? 3 : 1, stroke: '#3b4754', grid: { show: i === 0 } })),
      ],
      series: [
        { label: 't, s', value: (_u: uPlot, v: number | null) => (v === null ? '–' : v.toFixed(3)) },
        ...picked.map((s, i) => ({
          label: `${s.label}, ${s.unit}`,
          scale: units.includes(s.unit) ? s.unit : units[0],
          stroke: COLOURS[i % COLOURS.length],
          width: 1.5,
          value: (_u: uPlot, v: number | null) => (v === null ? '–' : v.toFixed(s.unit === 'state' ? 0 : 2)),
        })),
      ],
      legend: { live: true },
      cursor: { drag: { x: false, y: false } },
    };
    plot.current = new uPlot(options, [[], ...picked.map(() => [])], el);
    const resize = new ResizeObserver(() => plot.current?.setSize({ width: el.clientWidth, height: 180 }));
    resize.observe(el);
    return () => {
      resize.disconnect();
      plot.current?.destroy();
      plot.current = null;
    };
    // The chart's shape depends on the chosen signals only; rows come in through the effect below.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key]);

  useEffect(() => {
    if (!plot.current) return;
    const rows = Math.min(trace.time.length, Math.floor(shownUpTo / trace.intervalS + 1e-9) + 1);
    const x = Array.from(trace.time.subarray(0, rows));
    const ys = picked.map((s) => {
      const column = trace.columns[trace.names.indexOf(s.name)]!;
      return Array.from(column.subarray(0, rows), s.fromSi);
    });
    plot.current.setData([x, ...ys]);
    // picked follows key, which the chart effect above already tracks.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [trace, shownUpTo, key]);

  const download = () => {
    const url = URL.createObjectURL(new Blob([runCsv(trace)], { type: 'text/csv' }));
    const link = window.document.createElement('a');
    link.href = url;
    link.download = 'airproof-run.csv';
    link.click();
    URL.revokeObjectURL(url);
  };

  return (
    <section aria-label="Plot of the run" className="border-t border-rule px-3 py-2" data-testid="trace-plot">
      <div className="mb-1 flex flex-wrap items-center gap-2 text-sm">
        <label className="flex items-center gap-1 text-ink-soft">
          Add a signal
          <select
            value=""
            onChange={(e) => e.target.value && setChosen((c) => [...c, e.target.value].slice(-MAX_SIGNALS))}
            className="h-7 max-w-56 rounded-md border border-rule bg-paper-raised px-1 text-sm text-ink"
            data-testid="plot-add"
          >
            <option value="">choose…</option>
            {signals
              .filter((s) => !chosen.includes(s.name))
              .map((s) => (
                <option key={s.name} value={s.name}>
                  {s.label}, {s.unit}
                </option>
              ))}
          </select>
        </label>
        {picked.map((s, i) => (
          <button
            key={s.name}
            type="button"
            onClick={() => setChosen((c) => c.filter((n) => n !== s.name))}
            className="rounded border border-rule px-1.5 text-xs text-ink hover:bg-paper-sunk"
            style={{ borderLeft: `4px solid ${COLOURS[i % COLOURS.length]}` }}
            title="Take off the plot"
          >
            {s.label} ×
          </button>
        ))}
        <button type="button" onClick={download} className="ml-auto text-xs font-medium text-accent underline" data-testid="plot-csv">
          Download the run (CSV, SI units)
        </button>
      </div>
      {picked.length === 0 ? <p className="py-6 text-center text-sm text-ink-soft">Choose a signal to plot it against time.</p> : <div ref={box} className="w-full" data-testid="plot-area" />}
    </section>
  );
}

/** Starts with the first piston's travel and the pressures at its two ports, when there is a cylinder. */
function defaultChoice(signals: readonly PlotSignal[]): string[] {
  const position = signals.find((s) => s.name.endsWith(':x'));
  if (!position) return signals.slice(0, 2).map((s) => s.name);
  const id = position.name.split(':')[0];
  return [position.name, ...signals.filter((s) => s.name.startsWith(`${id}:p:`)).map((s) => s.name)].slice(0, 3);
}
