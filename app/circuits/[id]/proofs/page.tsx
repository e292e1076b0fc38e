import type { Metadata } from 'next';
import { requireSession } from '@/components/auth/require-session';
import { ProofsPage } from '@/components/proof/ProofsPage';
import { AppShell } from '@/components/shell/AppShell';
import { WorkspaceGate } from '@/components/workspace/WorkspaceGate';

export const metadata: Metadata = { title: 'Rules and proofs' };

export default async function CircuitProofsPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ proof?: string }> }) {
  const { id } = await params;
  const { proof } = await searchParams;
  const { displayName } = await requireSession(`/circuits/${id}/proofs`);
  return (
    <AppShell userName={displayName} width="full">
      <WorkspaceGate>
        <ProofsPage circuitId={id} proofId={typeof proof === 'string' ? proof : undefined} />
      </WorkspaceGate>
    </AppShell>
  );
}
