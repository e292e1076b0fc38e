'use client';

import { useQuery, useQueryClient } from '@tanstack/react-query';
import { ApiError } from '@/components/api/api-error';
import { requestJson } from '@/components/api/request-json';
import { FormAlert } from '@/components/forms/FormAlert';
import { TextLink } from '@/components/ui/TextLink';
import { useCan, useCurrentWorkspace } from '@/components/workspace/use-current-workspace';
import { circuitDocumentSchema } from '@/engine/document/schema';
// Types only: the shape comes from the server module, so client and route cannot drift apart.
import type { CircuitDetail } from '@/lib/circuits/get-circuit';
import { ApprovalNote } from '@/components/review/ApprovalNote';
import { CircuitEditor } from './CircuitEditor';

export const circuitKey = (id: string) => ['circuits', 'one', id] as const;

/** Loads a circuit's newest revision and opens it in the editor (read-only without edit rights). */
export function CircuitEditorPage({ circuitId }: { circuitId: string }) {
  const queryClient = useQueryClient();
  const workspace = useCurrentWorkspace();
  const canEdit = useCan('circuit:edit');
  const query = useQuery({
    queryKey: circuitKey(circuitId),
    queryFn: ({ signal }) => requestJson<CircuitDetail>(`/api/circuits/${circuitId}`, signal),
    retry: (count, error) => !(error instanceof ApiError && error.isClientError) && count < 2,
    // The editor owns the drawing once it is open; it is fetched again only when asked.
    staleTime: Infinity,
    refetchOnWindowFocus: false,
  });

  if (query.isPending || workspace.isPending) {
    return (
      <div className="h-[calc(100dvh-11rem)] min-h-[28rem] animate-pulse rounded-lg border border-rule bg-paper-sunk" aria-busy="true" aria-label="Loading the circuit" />
    );
  }
  if (query.isError) {
    const notFound = query.error instanceof ApiError && query.error.status === 404;
    return (
      <FormAlert tone="error">
        {notFound ? 'There is no such circuit in this workspace.' : query.error.message}{' '}
        <TextLink href="/circuits">Back to the circuits</TextLink>
      </FormAlert>
    );
  }
  const detail = query.data;
  const parsed = circuitDocumentSchema.safeParse(detail.revision?.document ?? { schemaVersion: 1 });
  if (!parsed.success) {
    return <FormAlert tone="error">This revision&rsquo;s drawing could not be read: {parsed.error.issues[0]?.message}</FormAlert>;
  }
  return (
    <CircuitEditor
      // A newer revision opens as a fresh editor: its own history and draft.
      key={detail.lockVersion}
      circuit={{ id: detail.id, title: detail.title, lockVersion: detail.lockVersion, revisionNumber: detail.revision?.number ?? 0, document: parsed.data }}
      canEdit={canEdit}
      status={
        <div className="flex flex-wrap items-center gap-x-3">
          <ApprovalNote circuitId={circuitId} />
          <TextLink href={`/circuits/${circuitId}/history`} className="text-xs" data-testid="history-link">
            Revisions and reviews
          </TextLink>
          <TextLink href={`/circuits/${circuitId}/proofs`} className="text-xs" data-testid="proofs-link">
            Rules and proofs
          </TextLink>
          <TextLink href={`/circuits/${circuitId}/logs`} className="text-xs" data-testid="logs-link">
            Field logs
          </TextLink>
        </div>
      }
      onReloadLatest={() => void queryClient.invalidateQueries({ queryKey: circuitKey(circuitId) })}
    />
  );
}
