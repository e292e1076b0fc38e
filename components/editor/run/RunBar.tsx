'use client';

import { Button } from '@/components/ui/Button';
import { RUN_SPEEDS, type RunStatus } from './use-live-run';

interface RunBarProps {
  status: RunStatus;
  t: number;
  speed: (typeof RUN_SPEEDS)[number];
  message: string | null;
  /** Machine seconds the engine simulates per second of its work. */
  pace: number | null;
  /** The playback waits for the engine. */
  waiting: boolean;
  /** How long the run may go on, s. */
  limitS: number;
  canRun: boolean;
  onStart: () => void;
  onPause: () => void;
  onResume: () => void;
  onStop: () => void;
  onStep: () => void;
  plotOpen: boolean;
  onTogglePlot: () => void;
  /** Stores the run so far with the revision, for a reviewer to replay; absent when it cannot be saved. */
  onSaveRun?: () => void;
  /** Why the run cannot be saved now, or what saving it did. */
  saveNote?: string | null;
  onSpeed: (speed: (typeof RUN_SPEEDS)[number]) => void;
  /** Faults injected into the run by hand, and whether their panel is open. */
  faultCount: number;
  faultsOpen: boolean;
  onToggleFaults: () => void;
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
      <Button size="sm" variant={props.faultCount ? 'secondary' : 'quiet'} onClick={props.onToggleFaults} aria-expanded={props.faultsOpen} title="Put faults into the run to see what they do" data-testid="run-faults">
        {props.faultCount ? `Faults (${props.faultCount})` : 'Faults'}
      </Button>
      {active && props.onSaveRun ? (
        <Button size="sm" variant="quiet" onClick={props.onSaveRun} disabled={status === 'starting' || status === 'failed'} title="Keep the inputs and the trace so far with this revision, for a reviewer to replay" data-testid="run-save">
          Save this run
        </Button>
      ) : null}
      {active && props.saveNote ? (
        <span className="text-xs text-ink-soft" role="status" data-testid="run-save-note">
          {props.saveNote}
        </span>
      ) : null}
      <output className="value text-ink" data-testid="run-time" data-t={t.toFixed(3)} aria-live="off">
        t = {t.toFixed(2)} s <span className="text-ink-faint">of at most {props.limitS} s</span>
      </output>
      <span className="text-ink-soft" role="status">
        {status === 'starting'
          ? 'Starting the engine…'
          : status === 'ended'
            ? `End of the run (the longest run of this drawing is ${props.limitS} s).`
            : status === 'failed'
              ? props.message
              : props.waiting
                ? 'Waiting for the engine…'
                : active
                  ? 'Click or hold buttons on the drawing to work them; Shift+click keeps a button pressed.'
                  : null}
      </span>
      {props.pace !== null && active ? (
        <span className="ml-auto text-xs text-ink-faint" data-testid="run-pace" title="Machine time the engine simulates per second of its own work">
          engine at {props.pace >= 10 ? Math.round(props.pace) : props.pace.toFixed(1)}× real time
        </span>
      ) : null}
    </div>
  );
}
