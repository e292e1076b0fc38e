'use client';

import { useQuery } from '@tanstack/react-query';
import { requestJson } from '@/components/api/request-json';
import { circuitKey } from '@/components/editor/CircuitEditorPage';
import { FormAlert } from '@/components/forms/FormAlert';
import { Button } from '@/components/ui/Button';
import { isJobActive } from '@/components/ui/job-status';
import { TextLink } from '@/components/ui/TextLink';
import type { CircuitDetail } from '@/lib/circuits/get-circuit';
import { fetchProof, proofKeys } from './proof-api';
import { RunSequence } from './RunSequence';

const KIND_WORDS: Record<string, string> = {
  button: 'pressed and let go at any step',
  'sensor-stuck-on': 'may stick on at any step',
  'sensor-stuck-off': 'may stick off at any step',
  'supply-loss': 'may lose its air at any step',
  'power-loss': 'may lose control power at any step',
};

const formatTime = (iso: string | null) => (iso ? new Date(iso).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short', timeZone: 'UTC' }) + ' UTC' : '–');

/**
 * One search as a document to print and file with the revision: what was checked, how far, what
 * held and what broke with each counterexample's inputs, and the caution that a simulation proof
 * does not replace a risk assessment or the validation of the built machine.
 */
export function ProofReport({ circuitId, proofId }: { circuitId: string; proofId: string }) {
  const circuit = useQuery({ queryKey: circuitKey(circuitId), queryFn: ({ signal }) => requestJson<CircuitDetail>(`/api/circuits/${circuitId}`, signal) });
  const proof = useQuery({ queryKey: proofKeys.proof(proofId), queryFn: ({ signal }) => fetchProof(proofId, signal), enabled: proofId !== '' });
  if (proofId === '') return <FormAlert tone="error">No search was named: open the report from a search on the Rules and proofs page.</FormAlert>;
  if (proof.isError) return <FormAlert tone="error">{proof.error.message}</FormAlert>;
  if (!proof.data) return <p className="text-sm text-ink-soft">Loading the report…</p>;
  const p = proof.data;
  const result = p.result;
  const held = result?.rules.filter((r) => r.status === 'passed').length ?? 0;
  const broken = result?.rules.filter((r) => r.status === 'failed').length ?? 0;
  return (
    <article className="mx-auto max-w-3xl space-y-5 text-ink print:max-w-none print:text-black" data-testid="proof-report">
      <div className="flex flex-wrap items-center justify-between gap-2 print:hidden">
        <TextLink href={`/circuits/${circuitId}/proofs?proof=${p.id}`}>Back to rules and proofs</TextLink>
        <Button onClick={() => window.print()} data-testid="report-print">
          Print
        </Button>
      </div>
      <header className="space-y-1 border-b border-rule pb-3 print:border-black">
        <p className="text-sm text-ink-soft print:text-black">Airproof · interlock proof report</p>
        <h1 className="text-2xl">{circuit.data?.title ?? 'Circuit'}</h1>
        <p className="text-sm">
          Revision {p.revisionNumber} · search started by {p.createdBy.name} on {formatTime(p.createdAt)}, finished {formatTime(p.finishedAt)}
        </p>
      </header>
      <section className="rounded-md border-2 border-caution bg-caution-soft p-3 text-sm print:border-black print:bg-transparent" data-testid="report-caution">
        <strong>Read this first.</strong> This report records what a simulation of the drawing did over the input timings listed below. A simulation proof supports, and never replaces, a risk
        assessment under the applicable machinery-safety standards and local codes, and a validation on the built machine, signed off by a competent person. It covers only the inputs, failures,
        time step and depth stated; the model is only as good as its parameters.
      </section>
      {isJobActive(p.status) ? <FormAlert tone="error">This search is still running: the report is not final.</FormAlert> : null}
      {p.error ? <FormAlert tone="error">The search could not finish: {p.error}</FormAlert> : null}
      <section className="space-y-2">
        <h2 className="text-lg">What was searched</h2>
        <ul className="list-disc space-y-0.5 pl-5 text-sm">
          {p.variations.map((v) => (
            <li key={`${v.tag}:${v.kind}`}>
              <span className="font-mono">{v.tag}</span> {KIND_WORDS[v.kind] ?? v.kind}
            </li>
          ))}
        </ul>
        <p className="text-sm">
          Time step {p.quantumS} s, depth {p.steps} steps (changes up to {(p.quantumS * p.steps).toFixed(2)} s), then {p.settleS} s more with no change.
        </p>
        {result ? (
          <p className="text-sm" data-testid="report-coverage">
            {result.complete ? 'The search reached the full depth.' : 'The search was stopped before the full depth; what follows covers only the part searched.'} {result.sequences.toLocaleString('en-GB')} input
            sequences were simulated and {result.states.toLocaleString('en-GB')} distinct states reached; {held} {held === 1 ? 'rule' : 'rules'} held and {broken} broke.
          </p>
        ) : null}
      </section>
      <section className="space-y-2">
        <h2 className="text-lg">Rules checked</h2>
        <pre className="overflow-x-auto whitespace-pre-wrap rounded-md border border-rule bg-paper p-3 font-mono text-xs print:border-black print:bg-transparent">{p.rulesText}</pre>
      </section>
      {result ? (
        <section className="space-y-3">
          <h2 className="text-lg">Results</h2>
          <table className="w-full text-sm" data-testid="report-results">
            <thead className="text-left text-xs text-ink-soft print:text-black">
              <tr>
                <th className="py-1 pr-2">Rule</th>
                <th className="py-1 pr-2">Verdict</th>
                <th className="py-1">Covered</th>
              </tr>
            </thead>
            <tbody>
              {result.rules.map((r) => (
                <tr key={r.name} className="border-t border-rule print:border-black">
                  <td className="py-1 pr-2">{r.name}</td>
                  <td className="py-1 pr-2 font-semibold">{r.status === 'passed' ? (result.complete ? 'held' : 'held in the part searched') : 'broken'}</td>
                  <td className="py-1">
                    {r.sequences.toLocaleString('en-GB')} sequences, {r.states.toLocaleString('en-GB')} states
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          {result.rules
            .filter((r) => r.counterexample)
            .map((r) => (
              <div key={r.name} className="space-y-1 break-inside-avoid rounded-md border border-danger/50 p-3 print:border-black" data-testid="report-counterexample">
                <h3 className="text-sm font-semibold">Counterexample to “{r.name}”</h3>
                <p className="text-sm">{r.counterexample!.explanation}</p>
                <p className="text-sm">Broken at {r.counterexample!.violatedAtS.toFixed(3)} s, found at depth {r.counterexample!.level}. Inputs, from the start of the run:</p>
                <ol className="list-decimal pl-5 text-sm">
                  {r.counterexample!.inputs.length ? r.counterexample!.inputs.map((i, n) => <li key={n}>{`${i.t.toFixed(2)} s: ${i.component} ${i.action}${i.parameter ? ` ${i.parameter} = ${i.value}` : ''}`}</li>) : <li>no input</li>}
                </ol>
                {r.counterexample!.runId ? <RunSequence circuitId={circuitId} revisionNumber={p.revisionNumber} runId={r.counterexample!.runId} /> : null}
              </div>
            ))}
        </section>
      ) : null}
      <footer className="border-t border-rule pt-2 text-xs text-ink-soft print:border-black print:text-black">
        Search {p.id}. Produced by Airproof from the stored result; replay the counterexamples on the Rules and proofs page of the circuit.
      </footer>
    </article>
  );
}
