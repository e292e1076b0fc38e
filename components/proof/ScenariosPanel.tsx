'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { ApiError } from '@/components/api/api-error';
import { handOperationOf } from '@/components/editor/run/hands';
import { FormAlert } from '@/components/forms/FormAlert';
import { Button } from '@/components/ui/Button';
import { useCan } from '@/components/workspace/use-current-workspace';
import type { CircuitDocument } from '@/engine/document/schema';
import { compileRulesText, ruleVocabulary, type RuleVerdict } from '@/engine/proof/rules';
import type { InputEvent } from '@/engine/solver/simulate';
import { createScenario, deleteScenario, fetchScenarios, proofKeys, runScenario, runScenarioSuite, updateScenario, type ScenarioFields, type ScenarioView, type SuiteEntry } from './proof-api';
import type { ReplayTarget } from './replay-target';
import { RulesEditor } from './RulesEditor';
import { VerdictList } from './VerdictList';

type Outcome = { passed: boolean; runId?: string; verdicts: RuleVerdict[]; error?: string };

/**
 * Named input sequences with what is expected of each run, kept with the circuit. Each can be run
 * on the newest revision, or all of them at once; every run is saved, and opens on the drawing.
 */
export function ScenariosPanel({ circuitId, document, onReplay }: { circuitId: string; document: CircuitDocument; onReplay: (target: ReplayTarget) => void }) {
  const queryClient = useQueryClient();
  const canEdit = useCan('scenario:edit');
  const canRun = useCan('circuit:run');
  const scenarios = useQuery({ queryKey: proofKeys.scenarios(circuitId), queryFn: ({ signal }) => fetchScenarios(circuitId, signal) });
  const [editing, setEditing] = useState<ScenarioView | 'new' | null>(null);
  const [outcomes, setOutcomes] = useState<ReadonlyMap<string, Outcome>>(new Map());
  const record = (id: string, outcome: Outcome) => setOutcomes((m) => new Map(m).set(id, outcome));

  const runOne = useMutation({
    mutationFn: (id: string) => runScenario(id),
    onSuccess: (r) => record(r.scenarioId, { passed: r.passed, runId: r.runId, verdicts: r.verdicts }),
  });
  const runAll = useMutation({
    mutationFn: () => runScenarioSuite(circuitId),
    onSuccess: (suite) => {
      const next = new Map<string, Outcome>();
      suite.results.forEach((r: SuiteEntry) => next.set(r.scenarioId, 'runId' in r ? { passed: r.passed, runId: r.runId, verdicts: r.verdicts } : { passed: false, verdicts: [], error: r.error.message }));
      setOutcomes(next);
    },
  });
  const remove = useMutation({
    mutationFn: (id: string) => deleteScenario(id),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: proofKeys.scenarios(circuitId) }),
  });

  if (scenarios.isError) return <FormAlert tone="error">{scenarios.error.message}</FormAlert>;
  const items = scenarios.data?.items ?? [];
  if (editing) {
    return (
      <ScenarioForm
        circuitId={circuitId}
        document={document}
        scenario={editing === 'new' ? null : editing}
        onDone={() => {
          setEditing(null);
          void queryClient.invalidateQueries({ queryKey: proofKeys.scenarios(circuitId) });
        }}
      />
    );
  }
  return (
    <div className="space-y-3" data-testid="scenarios-panel">
      <p className="text-sm text-ink-soft">A scenario is a timed sequence of inputs and the observations expected of it, written as rules. Each run is saved and can be replayed.</p>
      <div className="flex flex-wrap gap-2">
        {canEdit ? (
          <Button size="sm" onClick={() => setEditing('new')} data-testid="scenario-new">
            New scenario
          </Button>
        ) : null}
        {canRun && items.length ? (
          <Button size="sm" variant="secondary" onClick={() => runAll.mutate()} disabled={runAll.isPending} data-testid="scenario-run-all">
            {runAll.isPending ? 'Running them all…' : 'Run them all'}
          </Button>
        ) : null}
      </div>
      {runAll.error || runOne.error || remove.error ? <FormAlert tone="error">{(runAll.error ?? runOne.error ?? remove.error)!.message}</FormAlert> : null}
      {scenarios.data && items.length === 0 ? <p className="text-sm text-ink-soft">No scenario yet.</p> : null}
      <ul className="divide-y divide-rule rounded-md border border-rule bg-paper-raised" data-testid="scenario-list">
        {items.map((s) => {
          const outcome = outcomes.get(s.id);
          return (
            <li key={s.id} className="space-y-2 p-2" data-testid="scenario-item">
              <div className="flex flex-wrap items-center justify-between gap-2">
                <div className="min-w-0">
                  <p className="text-sm font-medium text-ink">{s.name}</p>
                  <p className="text-xs text-ink-soft">
                    {s.inputs.length === 1 ? '1 input' : `${s.inputs.length} inputs`} · runs {s.untilS} s
                    {outcome ? (
                      <>
                        {' '}
                        ·{' '}
                        <strong className={outcome.passed ? 'text-accent-strong' : 'text-danger'} data-testid="scenario-outcome">
                          {outcome.passed ? 'passed' : 'failed'}
                        </strong>
                      </>
                    ) : null}
                  </p>
                </div>
                <div className="flex flex-wrap gap-1">
                  {canRun ? (
                    <Button size="sm" variant="secondary" onClick={() => runOne.mutate(s.id)} disabled={runOne.isPending} data-testid="scenario-run">
                      Run
                    </Button>
                  ) : null}
                  {outcome?.runId ? (
                    <Button size="sm" variant="quiet" onClick={() => onReplay({ runId: outcome.runId!, title: `Scenario: ${s.name}`, rulesText: s.expectations })} data-testid="scenario-replay">
                      Replay
                    </Button>
                  ) : null}
                  {canEdit ? (
                    <>
                      <Button size="sm" variant="quiet" onClick={() => setEditing(s)}>
                        Edit
                      </Button>
                      <Button size="sm" variant="quiet" onClick={() => window.confirm(`Delete the scenario “${s.name}”?`) && remove.mutate(s.id)}>
                        Delete
                      </Button>
                    </>
                  ) : null}
                </div>
              </div>
              {outcome?.error ? <p className="text-sm text-danger">{outcome.error}</p> : null}
              {outcome && outcome.verdicts.length ? <VerdictList verdicts={outcome.verdicts} /> : null}
            </li>
          );
        })}
      </ul>
    </div>
  );
}

const ACTIONS: ReadonlyArray<InputEvent['action']> = ['press', 'release', 'toggle'];

function ScenarioForm({ circuitId, document, scenario, onDone }: { circuitId: string; document: CircuitDocument; scenario: ScenarioView | null; onDone: () => void }) {
  const operable = useMemo(() => document.components.filter((c) => handOperationOf(c) !== null).map((c) => c.tag), [document]);
  const vocabulary = useMemo(() => ruleVocabulary(document), [document]);
  const [name, setName] = useState(scenario?.name ?? '');
  const [untilS, setUntilS] = useState(String(scenario?.untilS ?? 4));
  const [inputs, setInputs] = useState<InputEvent[]>(scenario?.inputs ?? (operable[0] ? [{ t: 0.2, component: operable[0], action: 'press' }] : []));
  const [expectations, setExpectations] = useState(scenario?.expectations ?? '');
  const errors = useMemo(() => compileRulesText(expectations, document).errors, [expectations, document]);
  const save = useMutation({
    mutationFn: (fields: ScenarioFields) => (scenario ? updateScenario(scenario.id, scenario.revision, fields) : createScenario(circuitId, fields)),
    onSuccess: onDone,
  });
  const fieldError = (field: string) => (save.error instanceof ApiError && save.error.field?.startsWith(field) ? save.error.message : null);
  const until = Number(untilS);
  const untilProblem = !(until > 0) ? 'a time in seconds, more than 0' : inputs.some((i) => i.t > until) ? 'some inputs come after the end of the run' : null;

  const setInput = (index: number, patch: Partial<InputEvent>) => setInputs((list) => list.map((input, i) => (i === index ? { ...input, ...patch } : input)));

  return (
    <form
      className="space-y-3"
      onSubmit={(e) => {
        e.preventDefault();
        save.mutate({ name: name.trim(), untilS: until, inputs: [...inputs].sort((a, b) => a.t - b.t), expectations });
      }}
      data-testid="scenario-form"
    >
      <h3 className="text-sm font-medium">{scenario ? `Edit “${scenario.name}”` : 'New scenario'}</h3>
      <label className="block text-sm">
        Name
        <input value={name} onChange={(e) => setName(e.target.value)} aria-invalid={fieldError('name') !== null} className="mt-1 block h-9 w-full rounded-md border border-rule bg-paper-raised px-2" data-testid="scenario-name" />
        {fieldError('name') ? <span className="text-xs text-danger">{fieldError('name')}</span> : null}
      </label>
      <label className="block text-sm">
        Run for, s
        <input value={untilS} onChange={(e) => setUntilS(e.target.value)} inputMode="decimal" aria-invalid={untilProblem !== null} className="mt-1 block h-9 w-32 rounded-md border border-rule bg-paper-raised px-2" data-testid="scenario-until" />
        {untilProblem ? <span className="block text-xs text-danger">{untilProblem}</span> : null}
      </label>
      <fieldset className="space-y-1">
        <legend className="text-sm">Inputs</legend>
        {operable.length === 0 ? <p className="text-xs text-ink-soft">This drawing has no part worked by hand.</p> : null}
        {inputs.map((input, i) => (
          <div key={i} className="flex flex-wrap items-center gap-1 text-sm" data-testid="scenario-input">
            <label className="flex items-center gap-1">
              at
              <input
                type="number"
                min={0}
                step={0.05}
                value={input.t}
                onChange={(e) => setInput(i, { t: Number(e.target.value) })}
                className="h-8 w-20 rounded border border-rule bg-paper-raised px-1"
                aria-label="Time, s"
              />
              s
            </label>
            <select value={input.action} onChange={(e) => setInput(i, { action: e.target.value as InputEvent['action'] })} className="h-8 rounded border border-rule bg-paper-raised px-1" aria-label="Action">
              {ACTIONS.map((a) => (
                <option key={a}>{a}</option>
              ))}
            </select>
            <select value={input.component} onChange={(e) => setInput(i, { component: e.target.value })} className="h-8 rounded border border-rule bg-paper-raised px-1" aria-label="Part">
              {operable.map((tag) => (
                <option key={tag}>{tag}</option>
              ))}
            </select>
            <Button size="sm" variant="quiet" onClick={() => setInputs((list) => list.filter((_, j) => j !== i))} aria-label="Remove this input">
              Remove
            </Button>
          </div>
        ))}
        {operable.length ? (
          <Button size="sm" variant="secondary" onClick={() => setInputs((list) => [...list, { t: list.length ? list[list.length - 1]!.t + 0.5 : 0.2, component: operable[0]!, action: 'press' }])} data-testid="scenario-add-input">
            Add an input
          </Button>
        ) : null}
        {fieldError('inputs') ? <p className="text-xs text-danger">{fieldError('inputs')}</p> : null}
      </fieldset>
      <RulesEditor value={expectations} onChange={setExpectations} vocabulary={vocabulary} errors={errors} label="Expected observations (rules)" rows={5} testId="scenario-expectations" />
      {save.error && !fieldError('name') && !fieldError('inputs') ? <FormAlert tone="error">{save.error.message}</FormAlert> : null}
      <div className="flex gap-2">
        <Button type="submit" disabled={save.isPending || errors.length > 0 || untilProblem !== null || name.trim() === ''} data-testid="scenario-save">
          {save.isPending ? 'Saving…' : 'Save the scenario'}
        </Button>
        <Button variant="quiet" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
