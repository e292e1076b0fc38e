import type { Metadata } from 'next';
import { requireSession } from '@/components/auth/require-session';
import { SequencePrint } from '@/components/proof/SequencePrint';
import { AppShell } from '@/components/shell/AppShell';
import { WorkspaceGate } from '@/components/workspace/WorkspaceGate';

export const metadata: Metadata = { title: 'Sequence of a run' };

export default async function RunSequencePage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ run?: string }> }) {
  const { id } = await params;
  const { run } = await searchParams;
  const { displayName } = await requireSession(`/circuits/${id}/proofs/sequence${run ? `?run=${encodeURIComponent(run)}` : ''}`);
  return (
    <AppShell userName={displayName}>
      <WorkspaceGate>
        <SequencePrint circuitId={id} runId={typeof run === 'string' ? run : ''} />
      </WorkspaceGate>
    </AppShell>
  );
}
