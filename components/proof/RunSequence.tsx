'use client';

import { useQuery } from '@tanstack/react-query';
import { useMemo } from 'react';
import { requestJson } from '@/components/api/request-json';
import { FormAlert } from '@/components/forms/FormAlert';
import { fetchRunTrace, reviewKeys } from '@/components/review/review-api';
import { circuitDocumentSchema } from '@/engine/document/schema';
import { observedSequence } from '@/engine/proof/sequence';
import type { RevisionDetail } from '@/lib/circuits/revision-view';
import { DisplacementStepDiagram } from './DisplacementStepDiagram';
import { StepList } from './StepList';

/** The sequence a saved run went through, read from its trace on the drawing of its own revision. */
export function RunSequence({ circuitId, revisionNumber, runId }: { circuitId: string; revisionNumber: number; runId: string }) {
  const revision = useQuery({
    queryKey: ['circuits', circuitId, 'revision', revisionNumber],
    queryFn: ({ signal }) => requestJson<RevisionDetail>(`/api/circuits/${encodeURIComponent(circuitId)}/revisions/${revisionNumber}`, signal),
    staleTime: Infinity,
  });
  const trace = useQuery({ queryKey: reviewKeys.trace(runId), queryFn: ({ signal }) => fetchRunTrace(runId, signal), staleTime: Infinity });
  const sequence = useMemo(() => {
    if (!revision.data || !trace.data) return null;
    const document = circuitDocumentSchema.safeParse(revision.data.document);
    return document.success ? observedSequence(document.data, trace.data) : null;
  }, [revision.data, trace.data]);
  const error = revision.error ?? trace.error;
  if (error) return <FormAlert tone="error">{error.message}</FormAlert>;
  if (!sequence) return <p className="text-sm text-ink-soft">Reading the run…</p>;
  return (
    <div className="space-y-2" data-testid="run-sequence">
      <DisplacementStepDiagram sequence={sequence} />
      <StepList sequence={sequence} />
    </div>
  );
}
