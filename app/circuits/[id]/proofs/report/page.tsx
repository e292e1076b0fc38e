import type { Metadata } from 'next';
import { requireSession } from '@/components/auth/require-session';
import { ProofReport } from '@/components/proof/ProofReport';
import { AppShell } from '@/components/shell/AppShell';
import { WorkspaceGate } from '@/components/workspace/WorkspaceGate';

export const metadata: Metadata = { title: 'Proof report' };

export default async function ProofReportPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ proof?: string }> }) {
  const { id } = await params;
  const { proof } = await searchParams;
  const { displayName } = await requireSession(`/circuits/${id}/proofs/report${proof ? `?proof=${encodeURIComponent(proof)}` : ''}`);
  return (
    <AppShell userName={displayName}>
      <WorkspaceGate>
        <ProofReport circuitId={id} proofId={typeof proof === 'string' ? proof : ''} />
      </WorkspaceGate>
    </AppShell>
  );
}
