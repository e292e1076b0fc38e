'use client';

import { useQuery } from '@tanstack/react-query';
import { useEffect, useMemo, useState } from 'react';
import { frameAt, prepareRun, type RunFrame } from '@/components/editor/run/run-frame';
import { TracePlot } from '@/components/editor/run/TracePlot';
import { FormAlert } from '@/components/forms/FormAlert';
import { fetchRunTrace, reviewKeys } from '@/components/review/review-api';
import { runTraceOf } from '@/components/review/SavedRuns';
import { Button } from '@/components/ui/Button';
import { TextLink } from '@/components/ui/TextLink';
import type { CircuitDocument } from '@/engine/document/schema';
import { checkRules, compileRulesText } from '@/engine/proof/rules';
import { observedSequence } from '@/engine/proof/sequence';
import { DisplacementStepDiagram } from './DisplacementStepDiagram';
import { momentReadout } from './moment-readout';
import type { ReplayTarget } from './replay-target';
import { StepList } from './StepList';

/**
 * A saved run (a scenario's, or a counterexample) on the drawing: a time slider with the broken
 * rule's moment marked, the rules checked on the run with the one in question highlighted, what
 * its parts were doing at the moment on show, the plots, and the sequence the run went through.
 */
export function RunReplay({
  circuitId,
  target,
  document,
  onFrame,
  onClose,
}: {
  circuitId: string;
  target: ReplayTarget;
  document: CircuitDocument;
  onFrame: (frame: RunFrame | null) => void;
  onClose: () => void;
}) {
  const trace = useQuery({ queryKey: reviewKeys.trace(target.runId), queryFn: ({ signal }) => fetchRunTrace(target.runId, signal), staleTime: Infinity });
  const replay = useMemo(() => (trace.data ? runTraceOf(trace.data) : null), [trace.data]);
  const prepared = useMemo(() => (replay ? prepareRun(replay.names, document) : null), [document, replay]);
  const verdicts = useMemo(() => {
    if (!trace.data) return [];
    const { rules, errors } = compileRulesText(target.rulesText, document);
    return errors.length ? [] : checkRules(rules, trace.data);
  }, [trace.data, target.rulesText, document]);
  const focus = verdicts.find((v) => v.name === target.focusRule) ?? verdicts.find((v) => !v.holds) ?? null;
  const brokenAt = focus && !focus.holds ? focus.violatedAtS : null;
  const sequence = useMemo(() => (trace.data ? observedSequence(document, trace.data) : null), [document, trace.data]);
  const endS = replay && replay.time.length ? replay.time[replay.time.length - 1]! : 0;
  const [t, setT] = useState<number | null>(null);
  // The replay opens at the broken moment when there is one.
  const shown = Math.min(t ?? brokenAt ?? 0, endS);
  const atBreak = brokenAt !== null && Math.abs(shown - brokenAt) <= (replay?.intervalS ?? 0.01) / 2 + 1e-9;
  const moment = trace.data && focus ? momentReadout(trace.data, document, focus.tags, shown) : [];

  useEffect(() => {
    onFrame(prepared && replay ? frameAt(prepared, replay, shown) : null);
  }, [onFrame, prepared, replay, shown]);
  useEffect(() => () => onFrame(null), [onFrame]);

  return (
    <div className="space-y-3" data-testid="run-replay">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 className="text-sm font-medium" data-testid="replay-title">
          {target.title}
        </h3>
        <Button size="sm" variant="quiet" onClick={onClose}>
          Close the replay
        </Button>
      </div>
      {trace.isPending ? <p className="text-sm text-ink-soft">Loading the run…</p> : null}
      {trace.isError ? <FormAlert tone="error">{trace.error.message}</FormAlert> : null}
      {replay ? (
        <div className="space-y-1">
          <label className="block text-xs text-ink-soft">
            Machine time, s
            <input type="range" min={0} max={endS} step={replay.intervalS} value={shown} onChange={(e) => setT(Number(e.target.value))} className="block w-full" data-testid="replay-slider" />
          </label>
          {brokenAt !== null && endS > 0 ? (
            <div className="relative h-3" aria-hidden="true">
              <span className="absolute top-0 h-3 w-0.5 bg-danger" style={{ left: `${(brokenAt / endS) * 100}%` }} />
            </div>
          ) : null}
          <div className="flex flex-wrap items-center gap-2">
            <p className="value text-sm text-ink" data-testid="replay-time">
              t = {shown.toFixed(2)} s of {endS.toFixed(2)} s
            </p>
            {brokenAt !== null ? (
              <Button size="sm" variant="secondary" onClick={() => setT(brokenAt)} data-testid="replay-to-break">
                Go to the broken moment ({brokenAt.toFixed(2)} s)
              </Button>
            ) : null}
          </div>
        </div>
      ) : null}
      {verdicts.length ? (
        <ul className="space-y-1" data-testid="replay-rules">
          {verdicts.map((v) => {
            const highlighted = v === focus && !v.holds;
            return (
              <li
                key={`${v.line}:${v.name}`}
                className={`rounded-md border p-2 text-sm ${highlighted ? (atBreak ? 'border-danger bg-danger-soft' : 'border-danger/60') : 'border-rule'}`}
                data-testid={highlighted ? 'replay-broken-rule' : 'replay-rule'}
                data-at-break={highlighted && atBreak ? 'true' : undefined}
              >
                <span className={`mr-2 rounded px-1.5 text-xs font-semibold ${v.holds ? 'bg-accent-soft text-accent-strong' : 'bg-danger text-paper-raised'}`}>{v.holds ? 'held' : 'broken'}</span>
                <span className="font-medium">{v.name}</span>
                <span className="block text-xs text-ink-soft">
                  {v.explanation}
                  {highlighted && atBreak ? ' — this is the moment it broke.' : ''}
                </span>
              </li>
            );
          })}
        </ul>
      ) : null}
      {moment.length ? (
        <div className="rounded-md border border-rule bg-paper p-2" data-testid="replay-moment">
          <p className="text-xs text-ink-soft">At {shown.toFixed(2)} s:</p>
          <ul className="text-sm">
            {moment.map((line) => (
              <li key={line.tag}>
                <span className="font-mono text-ink">{line.tag}</span> <span className="value text-ink-soft">{line.text}</span>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {replay ? <TracePlot trace={replay} document={document} t={endS} /> : null}
      {sequence ? (
        <details className="space-y-2" open>
          <summary className="cursor-pointer text-sm font-medium">Sequence of this run</summary>
          <TextLink href={`/circuits/${circuitId}/proofs/sequence?run=${target.runId}`} className="text-xs" data-testid="replay-sequence-print">
            Open it to print
          </TextLink>
          <DisplacementStepDiagram sequence={sequence} />
          <StepList sequence={sequence} />
        </details>
      ) : null}
    </div>
  );
}
