'use client';

import { useQuery } from '@tanstack/react-query';
import { useEffect, useMemo, useState } from 'react';
import { ChangeTime } from '@/components/circuits/ChangeTime';
import { frameAt, prepareRun, type RunFrame, type RunTrace } from '@/components/editor/run/run-frame';
import { FormAlert } from '@/components/forms/FormAlert';
import { Button } from '@/components/ui/Button';
import type { CircuitDocument } from '@/engine/document/schema';
import type { Trace } from '@/engine/trace/trace';
import { fetchRunTrace, fetchSavedRuns, reviewKeys, type CommentAnchor } from './review-api';

/** A stored trace in the shape the drawing reads frames from. */
export function runTraceOf(trace: Trace): RunTrace {
  const columns = trace.signals.map((s) => Float64Array.from(s.values));
  let highestPa = 0;
  trace.signals.forEach((s, i) => {
    if (s.name.includes(':p:')) for (const p of columns[i]!) highestPa = Math.max(highestPa, p);
  });
  return { intervalS: trace.intervalS, time: Float64Array.from(trace.time), names: trace.signals.map((s) => s.name), columns, highestPa };
}

/**
 * The runs saved against this revision. Opening one replays it on the drawing with a time slider,
 * exactly as it ran (the inputs were stored and the trace with them), and lets a comment be pinned
 * to the moment on show.
 */
export function SavedRuns({
  circuitId,
  revisionNumber,
  document,
  onFrame,
  onPinMoment,
  focus,
}: {
  circuitId: string;
  revisionNumber: number;
  document: CircuitDocument;
  onFrame: (frame: RunFrame | null) => void;
  onPinMoment: (anchor: CommentAnchor) => void;
  /** A run moment to open (a comment pinned there was picked); give the component a new key to open another. */
  focus?: { runId: string; timeS: number };
}) {
  const runs = useQuery({ queryKey: reviewKeys.runs(circuitId), queryFn: ({ signal }) => fetchSavedRuns(circuitId, signal) });
  const [openRun, setOpenRun] = useState<string | null>(focus?.runId ?? null);
  const [t, setT] = useState(focus?.timeS ?? 0);
  const trace = useQuery({ queryKey: reviewKeys.trace(openRun ?? ''), queryFn: ({ signal }) => fetchRunTrace(openRun!, signal), enabled: openRun !== null, staleTime: Infinity });
  const replay = useMemo(() => (trace.data ? runTraceOf(trace.data) : null), [trace.data]);
  const prepared = useMemo(() => (replay ? prepareRun(replay.names, document) : null), [document, replay]);
  const endS = replay && replay.time.length ? replay.time[replay.time.length - 1]! : 0;
  useEffect(() => {
    onFrame(prepared && replay ? frameAt(prepared, replay, t) : null);
  }, [onFrame, prepared, replay, t]);
  const mine = (runs.data?.items ?? []).filter((r) => r.revisionNumber === revisionNumber);

  return (
    <div className="space-y-2" data-testid="saved-runs">
      {runs.isError ? <FormAlert tone="error">{runs.error.message}</FormAlert> : null}
      {runs.data && mine.length === 0 ? <p className="text-sm text-ink-soft">No run of revision {revisionNumber} has been saved. In the drawing, run it and use “Save this run”.</p> : null}
      <ul className="space-y-1">
        {mine.map((r) => (
          <li key={r.id} className="flex flex-wrap items-center justify-between gap-2 text-sm">
            <span className="text-ink">
              {r.name ?? `Run of ${r.untilS.toFixed(1)} s`} <span className="text-xs text-ink-soft">· {r.createdBy.name}, <ChangeTime iso={r.createdAt} /></span>
            </span>
            <Button
              size="sm"
              variant={openRun === r.id ? 'secondary' : 'quiet'}
              onClick={() => {
                setOpenRun(openRun === r.id ? null : r.id);
                setT(0);
              }}
              data-testid="saved-run-open"
            >
              {openRun === r.id ? 'Close' : 'Replay'}
            </Button>
          </li>
        ))}
      </ul>
      {openRun && trace.isPending ? <p className="text-sm text-ink-soft">Loading the run…</p> : null}
      {trace.isError ? <FormAlert tone="error">{trace.error.message}</FormAlert> : null}
      {replay ? (
        <div className="space-y-1">
          <label className="block text-xs text-ink-soft">
            Machine time, s
            <input
              type="range"
              min={0}
              max={endS}
              step={replay.intervalS}
              value={Math.min(t, endS)}
              onChange={(e) => setT(Number(e.target.value))}
              className="block w-full"
              data-testid="replay-slider"
            />
          </label>
          <p className="value text-sm text-ink" data-testid="replay-time">
            t = {t.toFixed(2)} s of {endS.toFixed(2)} s
          </p>
          <Button size="sm" variant="secondary" onClick={() => onPinMoment({ kind: 'run', runId: openRun!, timeS: Number(t.toFixed(3)) })} data-testid="replay-pin">
            Comment on this moment
          </Button>
        </div>
      ) : null}
    </div>
  );
}
