'use client';

import { Button } from '@/components/ui/Button';
import { RUN_HORIZON_S, RUN_SPEEDS, type RunStatus } from './use-live-run';

interface RunBarProps {
  status: RunStatus;
  t: number;
  speed: (typeof RUN_SPEEDS)[number];
  message: string | null;
  computeMs: number | null;
  canRun: boolean;
  onStart: () => void;
  onPause: () => void;
  onResume: () => void;
  onStop: () => void;
  onStep: () => void;
  plotOpen: boolean;
  onTogglePlot: () => void;
  onSpeed: (speed: (typeof RUN_SPEEDS)[number]) => void;
}

/** Starts, pauses and stops a run, sets its speed and shows the machine time. */
export function RunBar(props: RunBarProps) {
  const { status, t, speed } = props;
  const active = status !== 'stopped';
  return (
    <div className="flex flex-wrap items-center gap-2 border-b border-rule bg-paper-sunk/60 px-3 py-1.5 text-sm" data-testid="run-bar">
      {!active ? (
        <Button size="sm" variant="secondary" onClick={props.onStart} disabled={!props.canRun} data-testid="run-start" title={props.canRun ? 'Simulate the drawing' : 'Fix the errors under Checks first'}>
          ▶ Run
        </Button>
      ) : (
        <>
          {status === 'playing' ? (
            <Button size="sm" variant="secondary" onClick={props.onPause} data-testid="run-pause">
              Pause
            </Button>
          ) : status === 'paused' ? (
            <>
              <Button size="sm" variant="secondary" onClick={props.onResume} data-testid="run-resume">
                Resume
              </Button>
              <Button size="sm" variant="quiet" onClick={props.onStep} title="10 ms further" data-testid="run-step">
                Step
              </Button>
            </>
          ) : null}
          <Button size="sm" variant="quiet" onClick={props.onStop} data-testid="run-stop">
            Stop and edit
          </Button>
        </>
      )}
      <label className="flex items-center gap-1 text-ink-soft">
        Speed
        <select
          value={speed}
          onChange={(e) => props.onSpeed(Number(e.target.value) as (typeof RUN_SPEEDS)[number])}
          className="h-7 rounded-md border border-rule bg-paper-raised px-1 text-sm text-ink"
          data-testid="run-speed"
        >
          {RUN_SPEEDS.map((s) => (
            <option key={s} value={s}>
              {Number.isFinite(s) ? `${s}×` : 'as fast as possible'}
            </option>
          ))}
        </select>
      </label>
      {active ? (
        <Button size="sm" variant="quiet" onClick={props.onTogglePlot} aria-expanded={props.plotOpen} data-testid="run-plot">
          {props.plotOpen ? 'Hide plot' : 'Plot'}
        </Button>
      ) : null}
      <output className="value text-ink" data-testid="run-time" data-t={t.toFixed(3)} aria-live="off">
        t = {t.toFixed(2)} s <span className="text-ink-faint">of {RUN_HORIZON_S} s</span>
      </output>
      <span className="text-ink-soft" role="status">
        {status === 'starting' ? 'Working out the run…' : status === 'ended' ? 'End of the simulated time.' : status === 'failed' ? props.message : active ? 'Click or hold buttons on the drawing to work them; Shift+click keeps a button pressed.' : null}
      </span>
      {props.computeMs !== null && active ? <span className="ml-auto text-xs text-ink-faint">computed in {Math.round(props.computeMs)} ms</span> : null}
    </div>
  );
}
