'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect, useMemo, useState } from 'react';
import { requestJson } from '@/components/api/request-json';
import { ChangeTime } from '@/components/circuits/ChangeTime';
import { frameAt, prepareRun, type RunFrame } from '@/components/editor/run/run-frame';
import { TracePlot } from '@/components/editor/run/TracePlot';
import { FormAlert } from '@/components/forms/FormAlert';
import { fetchRunTrace, reviewKeys } from '@/components/review/review-api';
import { runTraceOf } from '@/components/review/SavedRuns';
import { Button } from '@/components/ui/Button';
import { useCan } from '@/components/workspace/use-current-workspace';
import type { CircuitDocument } from '@/engine/document/schema';
import type { Comparison } from '@/engine/replay';
import type { ReplaySummary } from '@/lib/replays/replays';
import type { RunDetail } from '@/lib/runs/get-run';
import { EdgeLanes } from './EdgeLanes';
import { replayLog, type UploadDetail } from './logs-api';

const replaysKey = (logId: string) => ['logs', logId, 'replays'] as const;

/**
 * The log replayed on the drawing: its commands drive the model, and what the machine's sensors
 * did is set against what the model's did — the match in words, the first divergence marked,
 * every observed edge paired with its timing difference, and the drawing at any moment.
 */
export function ReplayView({ log, document, onFrame }: { log: UploadDetail; document: CircuitDocument; onFrame: (frame: RunFrame | null) => void }) {
  const queryClient = useQueryClient();
  const canRun = useCan('replay:run');
  const earlier = useQuery({ queryKey: replaysKey(log.id), queryFn: ({ signal }) => requestJson<{ items: ReplaySummary[] }>(`/api/logs/${encodeURIComponent(log.id)}/replays`, signal) });
  const [runId, setRunId] = useState<string | null>(null);
  const replay = useMutation({
    mutationFn: () => replayLog(log.id),
    onSuccess: ({ runId: id }) => {
      setRunId(id);
      void queryClient.invalidateQueries({ queryKey: replaysKey(log.id) });
    },
  });
  const shown = runId ?? earlier.data?.items[0]?.runId ?? null;

  return (
    <div className="space-y-3" data-testid="replay-view">
      {log.mapping === null ? <p className="text-sm text-ink-soft">Save a mapping of the columns first: the replay needs to know which columns drive the machine and which to compare.</p> : null}
      {canRun && log.mapping ? (
        <Button onClick={() => replay.mutate()} disabled={replay.isPending} data-testid="replay-start">
          {replay.isPending ? 'Replaying…' : shown ? 'Replay it again' : 'Replay the log on the drawing'}
        </Button>
      ) : null}
      {replay.error ? <FormAlert tone="error">{replay.error.message}</FormAlert> : null}
      {shown ? <ReplayRun key={shown} runId={shown} durationS={log.durationS} document={document} onFrame={onFrame} /> : null}
      {earlier.data && earlier.data.items.length > 1 ? (
        <details className="text-sm">
          <summary className="cursor-pointer text-ink-soft">Earlier replays of this log</summary>
          <ul className="mt-1 space-y-1">
            {earlier.data.items.map((r) => (
              <li key={r.runId} className="flex flex-wrap items-center gap-2">
                <span className="value">{r.match.toFixed(0)} %</span> <span className="text-ink-soft">revision {r.revisionNumber}, {r.createdBy.name},</span> <ChangeTime iso={r.createdAt} />
                <Button size="sm" variant="quiet" onClick={() => setRunId(r.runId)}>
                  Show
                </Button>
              </li>
            ))}
          </ul>
        </details>
      ) : null}
    </div>
  );
}

function ReplayRun({ runId, durationS, document, onFrame }: { runId: string; durationS: number | null; document: CircuitDocument; onFrame: (frame: RunFrame | null) => void }) {
  const run = useQuery({ queryKey: ['runs', runId], queryFn: ({ signal }) => requestJson<RunDetail>(`/api/runs/${encodeURIComponent(runId)}`, signal), staleTime: Infinity });
  const trace = useQuery({ queryKey: reviewKeys.trace(runId), queryFn: ({ signal }) => fetchRunTrace(runId, signal), staleTime: Infinity });
  const comparison = (run.data?.summary as { comparison?: Comparison } | undefined)?.comparison ?? null;
  const replayTrace = useMemo(() => (trace.data ? runTraceOf(trace.data) : null), [trace.data]);
  const prepared = useMemo(() => (replayTrace ? prepareRun(replayTrace.names, document) : null), [document, replayTrace]);
  const endS = durationS ?? (replayTrace && replayTrace.time.length ? replayTrace.time[replayTrace.time.length - 1]! : 0);
  const [t, setT] = useState<number | null>(null);
  const at = Math.min(t ?? comparison?.firstDivergence?.t ?? 0, endS);

  useEffect(() => {
    onFrame(prepared && replayTrace ? frameAt(prepared, replayTrace, at) : null);
  }, [onFrame, prepared, replayTrace, at]);
  useEffect(() => () => onFrame(null), [onFrame]);

  const error = run.error ?? trace.error;
  if (error) return <FormAlert tone="error">{error.message}</FormAlert>;
  if (!comparison || !replayTrace) return <p className="text-sm text-ink-soft">Loading the replay…</p>;
  const divergence = comparison.firstDivergence;
  return (
    <div className="space-y-3">
      <div className="rounded-md border border-rule bg-paper-raised p-3" data-testid="replay-comparison">
        <p className="text-sm">
          <strong className="value text-lg" data-testid="replay-match">
            {comparison.match.toFixed(0)} %
          </strong>{' '}
          match with the model · revision {run.data?.revisionNumber}
        </p>
        <p className="text-sm text-ink" data-testid="replay-summary">
          {comparison.summary}
        </p>
        {divergence ? (
          <p className="mt-1 text-sm text-danger" data-testid="replay-divergence">
            First divergence at {divergence.t.toFixed(3)} s on {divergence.tag} {divergence.word}: {divergence.description}{' '}
            <Button size="sm" variant="quiet" onClick={() => setT(divergence.t)}>
              Show that moment
            </Button>
          </p>
        ) : (
          <p className="mt-1 text-sm text-accent-strong">No divergence beyond the tolerances.</p>
        )}
      </div>
      <label className="block text-xs text-ink-soft">
        Machine time, s
        <input type="range" min={0} max={endS} step={replayTrace.intervalS} value={at} onChange={(e) => setT(Number(e.target.value))} className="block w-full" data-testid="replay-log-slider" />
      </label>
      <p className="value text-sm" data-testid="replay-log-time">
        t = {at.toFixed(2)} s of {endS.toFixed(2)} s
      </p>
      <EdgeLanes comparison={comparison} durationS={endS} t={at} onPick={setT} />
      <TracePlot trace={replayTrace} document={document} t={endS} />
    </div>
  );
}
