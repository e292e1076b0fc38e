'use client';

import { useQuery } from '@tanstack/react-query';
import { requestJson } from '@/components/api/request-json';
import { ChangeTime } from '@/components/circuits/ChangeTime';
import { circuitKey } from '@/components/editor/CircuitEditorPage';
import type { CircuitDetail } from '@/lib/circuits/get-circuit';

/** Which revision of the circuit is approved, by whom and when; or that none is. */
export function ApprovalNote({ circuitId }: { circuitId: string }) {
  const circuit = useQuery({ queryKey: circuitKey(circuitId), queryFn: ({ signal }) => requestJson<CircuitDetail>(`/api/circuits/${circuitId}`, signal) });
  if (!circuit.data) return null;
  const approval = circuit.data.approval;
  if (!approval) {
    return (
      <p className="text-xs text-ink-soft" data-testid="approval-note">
        No approved revision yet
      </p>
    );
  }
  return (
    <p className="text-xs text-ink" data-testid="approval-note">
      <span className="inline-block rounded-sm bg-accent-soft px-1 font-medium text-accent-strong">Approved</span> revision <span className="value">{approval.revisionNumber}</span> by {approval.decidedBy.name}, <ChangeTime iso={approval.decidedAt} />
    </p>
  );
}
