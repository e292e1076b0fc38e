'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect, useMemo, useState } from 'react';
import { ApiError } from '@/components/api/api-error';
import { ChangeTime } from '@/components/circuits/ChangeTime';
import { FormAlert } from '@/components/forms/FormAlert';
import { SafetyNote } from '@/components/shell/SafetyNote';
import { Button } from '@/components/ui/Button';
import { isJobActive, JOB_POLL_MS, JOB_STATUS_LABEL, timeToGo } from '@/components/ui/job-status';
import { Pagination } from '@/components/ui/Pagination';
import { ProgressMeter } from '@/components/ui/ProgressMeter';
import { TextLink } from '@/components/ui/TextLink';
import { useCan } from '@/components/workspace/use-current-workspace';
import type { CircuitDocument } from '@/engine/document/schema';
import { describeVariations, type Variation, type VariationKind } from '@/engine/proof/search';
import { cancelProof, fetchProof, fetchProofs, proofKeys, startProof, type ProofDetail } from './proof-api';
import type { ReplayTarget } from './replay-target';

const KIND_LABEL: Record<VariationKind, string> = {
  button: 'pressed and let go',
  'sensor-stuck-on': 'stuck on',
  'sensor-stuck-off': 'stuck off',
  'supply-loss': 'air lost',
  'power-loss': 'control power lost',
};

/**
 * The exhaustive timing search: which inputs, failures and energy losses to vary, at what time
 * quantum and to what depth; its progress while a worker runs it; then each rule's verdict with
 * what was covered, and the shortest counterexample of a broken rule to replay.
 */
export function SearchPanel({
  circuitId,
  document,
  revisionNumber,
  savedRules,
  rulesDraftDiffers,
  proofId,
  onProofId,
  onReplay,
}: {
  circuitId: string;
  document: CircuitDocument;
  revisionNumber: number;
  /** The rules as saved: a search checks those. */
  savedRules: string;
  rulesDraftDiffers: boolean;
  proofId: string | null;
  onProofId: (id: string | null) => void;
  onReplay: (target: ReplayTarget) => void;
}) {
  const queryClient = useQueryClient();
  const canRun = useCan('proof:run');
  const offered = useMemo(() => describeVariations(document), [document]);
  const [chosen, setChosen] = useState<ReadonlySet<string>>(() => new Set(offered.filter((o) => o.kinds.includes('button')).map((o) => `${o.tag}|button`)));
  const [quantum, setQuantum] = useState('0.25');
  const [steps, setSteps] = useState('8');
  const [settle, setSettle] = useState('1');
  const [page, setPage] = useState(1);

  const variations: Variation[] = [...chosen].map((key) => {
    const [tag, kind] = key.split('|') as [string, VariationKind];
    return { tag, kind };
  });
  const quantumS = Number(quantum);
  const stepCount = Number(steps);
  const settleS = Number(settle);
  const problems = {
    quantum: quantumS >= 0.05 && quantumS <= 2 ? null : 'between 0.05 and 2 s',
    steps: Number.isInteger(stepCount) && stepCount >= 1 && stepCount <= 12 ? null : 'a whole number from 1 to 12',
    settle: settleS >= 0 && settleS <= 5 ? null : 'between 0 and 5 s',
    variations: variations.length ? null : 'choose at least one',
    rules: savedRules.trim() ? null : 'save at least one rule first (Rules tab)',
  };
  const blocked = Object.values(problems).some((p) => p !== null);

  const start = useMutation({
    mutationFn: () => startProof(circuitId, { revisionNumber, rulesText: savedRules, variations, quantumS, steps: stepCount, settleS }),
    onSuccess: ({ id }) => {
      onProofId(id);
      void queryClient.invalidateQueries({ queryKey: proofKeys.allProofs(circuitId) });
    },
  });
  const startField = start.error instanceof ApiError ? start.error.field : undefined;

  const history = useQuery({ queryKey: proofKeys.proofs(circuitId, page), queryFn: ({ signal }) => fetchProofs(circuitId, page, signal) });
  const toggle = (key: string) =>
    setChosen((set) => {
      const next = new Set(set);
      if (!next.delete(key)) next.add(key);
      return next;
    });

  return (
    <div className="space-y-3" data-testid="search-panel">
      <p className="text-sm text-ink-soft">
        Tries every combination and timing of the chosen changes, one change point every time step, to the chosen depth, and checks the saved rules on every run. States already reached are not explored
        again. A broken rule comes with its shortest counterexample.
      </p>
      {rulesDraftDiffers ? <p className="text-xs text-caution">The Rules tab has changes not saved yet: the search checks the rules as saved.</p> : null}
      {canRun ? (
        <form
          className="space-y-3"
          onSubmit={(e) => {
            e.preventDefault();
            start.mutate();
          }}
        >
          <fieldset className="space-y-1">
            <legend className="text-sm font-medium">What may change</legend>
            {offered.length === 0 ? <p className="text-xs text-ink-soft">Nothing on this drawing can be varied: add a button, a sensor or a supply.</p> : null}
            {offered.map((o) => (
              <div key={o.tag} className="flex flex-wrap items-center gap-x-3 text-sm">
                <span className="w-14 font-mono text-ink">{o.tag}</span>
                {o.kinds.map((kind) => (
                  <label key={kind} className="flex items-center gap-1 text-ink-soft">
                    <input type="checkbox" checked={chosen.has(`${o.tag}|${kind}`)} onChange={() => toggle(`${o.tag}|${kind}`)} data-testid={`vary-${o.tag}-${kind}`} />
                    {KIND_LABEL[kind]}
                  </label>
                ))}
              </div>
            ))}
            {problems.variations ? <p className="text-xs text-danger">{problems.variations}</p> : null}
          </fieldset>
          <div className="flex flex-wrap gap-3">
            <NumberField label="Time step, s" value={quantum} onChange={setQuantum} problem={problems.quantum ?? (startField === 'quantumS' ? start.error!.message : null)} testId="search-quantum" />
            <NumberField label="Depth, steps" value={steps} onChange={setSteps} problem={problems.steps ?? (startField === 'steps' ? start.error!.message : null)} testId="search-steps" />
            <NumberField label="Run on after, s" value={settle} onChange={setSettle} problem={problems.settle ?? (startField === 'settleS' ? start.error!.message : null)} testId="search-settle" />
          </div>
          {!blocked ? (
            <p className="text-xs text-ink-soft" data-testid="search-scope">
              Horizon {(quantumS * stepCount).toFixed(2)} s of changes, then {settleS} s more; without merging states that would be up to {sequenceBound(variations.length, stepCount)} input sequences.
            </p>
          ) : null}
          {problems.rules ? <p className="text-xs text-danger">{problems.rules}</p> : null}
          {start.error && !['quantumS', 'steps', 'settleS'].includes(startField ?? '') ? <FormAlert tone="error">{start.error.message}</FormAlert> : null}
          <Button type="submit" disabled={blocked || start.isPending} data-testid="search-start">
            {start.isPending ? 'Starting…' : 'Start the search'}
          </Button>
        </form>
      ) : (
        <p className="text-sm text-ink-soft">Your role can read the searches but not start one.</p>
      )}
      {proofId ? <ProofView key={proofId} proofId={proofId} circuitId={circuitId} onReplay={onReplay} /> : null}
      <section className="space-y-2">
        <h3 className="text-sm font-medium">Earlier searches</h3>
        {history.isError ? <FormAlert tone="error">{history.error.message}</FormAlert> : null}
        {history.data && history.data.items.length === 0 ? <p className="text-sm text-ink-soft">None yet.</p> : null}
        {history.data && history.data.items.length ? (
          <div className="overflow-x-auto">
            <table className="w-full text-sm" data-testid="search-history">
              <thead className="text-left text-xs text-ink-soft">
                <tr>
                  <th className="py-1 pr-2">Started</th>
                  <th className="py-1 pr-2">Revision</th>
                  <th className="py-1 pr-2">State</th>
                  <th className="py-1 pr-2">Rules held / broken</th>
                  <th className="py-1" />
                </tr>
              </thead>
              <tbody>
                {history.data.items.map((p) => (
                  <tr key={p.id} className={`border-t border-rule ${p.id === proofId ? 'bg-accent-soft/50' : ''}`}>
                    <td className="py-1 pr-2">
                      <ChangeTime iso={p.createdAt} /> <span className="text-xs text-ink-soft">by {p.createdBy.name}</span>
                    </td>
                    <td className="value py-1 pr-2">{p.revisionNumber}</td>
                    <td className="py-1 pr-2">{JOB_STATUS_LABEL[p.status]}</td>
                    <td className="value py-1 pr-2">{p.outcome ? `${p.outcome.passed} / ${p.outcome.failed}${p.outcome.complete ? '' : ' (partial)'}` : '–'}</td>
                    <td className="py-1 text-right">
                      <Button size="sm" variant="quiet" onClick={() => onProofId(p.id)}>
                        Open
                      </Button>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        ) : null}
        {history.data && history.data.total > history.data.pageSize ? (
          <Pagination page={page} pageCount={Math.ceil(history.data.total / history.data.pageSize)} onPageChange={setPage} busy={history.isFetching} label="Earlier searches" />
        ) : null}
      </section>
    </div>
  );
}

function NumberField({ label, value, onChange, problem, testId }: { label: string; value: string; onChange: (v: string) => void; problem: string | null; testId: string }) {
  return (
    <label className="block text-sm">
      {label}
      <input
        value={value}
        onChange={(e) => onChange(e.target.value)}
        inputMode="decimal"
        aria-invalid={problem !== null}
        className="mt-1 block h-9 w-28 rounded-md border border-rule bg-paper-raised px-2 aria-invalid:border-danger"
        data-testid={testId}
      />
      {problem ? <span className="block max-w-[12rem] text-xs text-danger">{problem}</span> : null}
    </label>
  );
}

/** Every subset of the variations may change at every step: (2^v)^steps sequences before merging. */
function sequenceBound(variations: number, steps: number): string {
  const exponent = variations * steps;
  return exponent <= 40 ? (2 ** exponent).toLocaleString('en-GB') : `2^${exponent}`;
}

function ProofView({ proofId, circuitId, onReplay }: { proofId: string; circuitId: string; onReplay: (target: ReplayTarget) => void }) {
  const queryClient = useQueryClient();
  const canRun = useCan('proof:run');
  const proof = useQuery({
    queryKey: proofKeys.proof(proofId),
    queryFn: ({ signal }) => fetchProof(proofId, signal),
    refetchInterval: (query) => (query.state.data && !isJobActive(query.state.data.status) ? false : JOB_POLL_MS),
  });
  const status = proof.data?.status;
  // The list of earlier searches shows this one's state too: it follows each change of state.
  useEffect(() => {
    if (status) void queryClient.invalidateQueries({ queryKey: proofKeys.allProofs(circuitId) });
  }, [queryClient, circuitId, status]);
  const cancel = useMutation({
    mutationFn: () => cancelProof(proofId),
    onSuccess: (detail) => queryClient.setQueryData(proofKeys.proof(proofId), detail),
  });
  if (proof.isError) return <FormAlert tone="error">{proof.error.message}</FormAlert>;
  if (!proof.data) return <p className="text-sm text-ink-soft">Loading the search…</p>;
  const p = proof.data;
  const active = isJobActive(p.status);
  return (
    <section className="space-y-2 rounded-md border border-rule bg-paper-raised p-3" data-testid="proof-view" aria-live="polite">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 className="text-sm font-medium">
          Search of revision {p.revisionNumber} · <span data-testid="proof-status">{JOB_STATUS_LABEL[p.status]}</span>
        </h3>
        <div className="flex gap-2">
          {active && canRun ? (
            <Button size="sm" variant="secondary" onClick={() => cancel.mutate()} disabled={cancel.isPending} data-testid="proof-cancel">
              Stop the search
            </Button>
          ) : null}
          {p.result ? (
            <TextLink href={`/circuits/${circuitId}/proofs/report?proof=${p.id}`} className="text-sm" data-testid="proof-report-link">
              Printable report
            </TextLink>
          ) : null}
        </div>
      </div>
      <p className="text-xs text-ink-soft">
        Varying {p.variations.map((v) => `${v.tag} (${KIND_LABEL[v.kind]})`).join(', ')} · time step {p.quantumS} s · depth {p.steps} · run on {p.settleS} s
      </p>
      {p.progress ? <ProgressBar proof={p} /> : active ? <p className="text-sm text-ink-soft">Waiting for a worker to take the search…</p> : null}
      {p.error ? <FormAlert tone="error">{p.error}</FormAlert> : null}
      {cancel.error ? <FormAlert tone="error">{cancel.error.message}</FormAlert> : null}
      {p.result ? <ResultTable proof={p} onReplay={onReplay} /> : null}
      {p.result ? <SafetyNote /> : null}
    </section>
  );
}

function ProgressBar({ proof }: { proof: ProofDetail }) {
  const progress = proof.progress!;
  return (
    <ProgressMeter done={progress.done} total={progress.total} label="Sequences simulated" testId="proof-progress">
      {progress.done.toLocaleString('en-GB')} of about {progress.total.toLocaleString('en-GB')} sequences · depth {progress.level} of {progress.levels} · {progress.states.toLocaleString('en-GB')} distinct states · {progress.elapsedS.toFixed(1)} s
      elapsed{timeToGo(progress.estimateS, proof.status)}
    </ProgressMeter>
  );
}

function ResultTable({ proof, onReplay }: { proof: ProofDetail; onReplay: (target: ReplayTarget) => void }) {
  const result = proof.result!;
  return (
    <div className="space-y-2">
      <p className="text-sm text-ink" data-testid="proof-coverage">
        {result.complete ? 'Searched to the full depth' : 'Stopped before the full depth'}: {result.sequences.toLocaleString('en-GB')} input sequences simulated, {result.states.toLocaleString('en-GB')} distinct states, {result.levels}{' '}
        {result.levels === 1 ? 'step' : 'steps'} of {result.quantumS} s, in {result.elapsedS.toFixed(1)} s.
      </p>
      <div className="overflow-x-auto">
        <table className="w-full text-sm" data-testid="proof-results">
          <thead className="text-left text-xs text-ink-soft">
            <tr>
              <th className="py-1 pr-2">Rule</th>
              <th className="py-1 pr-2">Verdict</th>
              <th className="py-1 pr-2">Covered</th>
              <th className="py-1">Counterexample</th>
            </tr>
          </thead>
          <tbody>
            {result.rules.map((rule) => (
              <tr key={rule.name} className="border-t border-rule align-top" data-testid="proof-rule">
                <td className="py-1 pr-2 font-medium text-ink">{rule.name}</td>
                <td className="py-1 pr-2">
                  <span className={`rounded px-1.5 text-xs font-semibold ${rule.status === 'passed' ? 'bg-accent-soft text-accent-strong' : 'bg-danger-soft text-danger'}`} data-testid="proof-rule-verdict">
                    {rule.status === 'passed' ? (result.complete ? 'held' : 'held so far') : 'broken'}
                  </span>
                </td>
                <td className="value py-1 pr-2 text-xs text-ink-soft">
                  {rule.sequences.toLocaleString('en-GB')} sequences, {rule.states.toLocaleString('en-GB')} states
                </td>
                <td className="py-1 text-xs">
                  {rule.counterexample ? (
                    <div className="space-y-1">
                      <p className="text-ink-soft">{rule.counterexample.explanation}</p>
                      <p className="value text-ink-soft">{rule.counterexample.inputs.map((i) => `${i.component} ${i.action} at ${i.t.toFixed(2)} s`).join(', ') || 'no input at all'}</p>
                      {rule.counterexample.runId ? (
                        <Button size="sm" variant="secondary" onClick={() => onReplay({ runId: rule.counterexample!.runId!, title: `Counterexample: ${rule.name}`, rulesText: proof.rulesText, focusRule: rule.name })} data-testid="proof-replay">
                          Replay on the drawing
                        </Button>
                      ) : null}
                    </div>
                  ) : (
                    <span className="text-ink-soft">none found</span>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
