'use client';

import { useQuery } from '@tanstack/react-query';
import { requestJson } from '@/components/api/request-json';
import { FormAlert } from '@/components/forms/FormAlert';
import { Button } from '@/components/ui/Button';
import { TextLink } from '@/components/ui/TextLink';
import type { RunDetail } from '@/lib/runs/get-run';
import { RunSequence } from './RunSequence';

/** One saved run's sequence on a page of its own, to print: the displacement-step diagram and the step list. */
export function SequencePrint({ circuitId, runId }: { circuitId: string; runId: string }) {
  const run = useQuery({ queryKey: ['runs', runId], queryFn: ({ signal }) => requestJson<RunDetail>(`/api/runs/${encodeURIComponent(runId)}`, signal), enabled: runId !== '' });
  if (runId === '') return <FormAlert tone="error">No run was named: open this page from a replay.</FormAlert>;
  if (run.isError) return <FormAlert tone="error">{run.error.message}</FormAlert>;
  if (!run.data) return <p className="text-sm text-ink-soft">Loading the run…</p>;
  return (
    <article className="mx-auto max-w-4xl space-y-4 print:max-w-none print:text-black" data-testid="sequence-print">
      <div className="flex flex-wrap items-center justify-between gap-2 print:hidden">
        <TextLink href={`/circuits/${circuitId}/proofs`}>Back to rules and proofs</TextLink>
        <Button onClick={() => window.print()}>Print</Button>
      </div>
      <header className="border-b border-rule pb-2 print:border-black">
        <p className="text-sm text-ink-soft print:text-black">Airproof · sequence of a run</p>
        <h1 className="text-xl">{run.data.name ?? 'Saved run'}</h1>
        <p className="text-sm">Revision {run.data.revisionNumber}</p>
      </header>
      <RunSequence circuitId={circuitId} revisionNumber={run.data.revisionNumber} runId={runId} />
    </article>
  );
}
