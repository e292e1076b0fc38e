import type { Metadata } from 'next';
import { requireSession } from '@/components/auth/require-session';
import { RevisionHistory } from '@/components/review/RevisionHistory';
import { AppShell } from '@/components/shell/AppShell';
import { WorkspaceGate } from '@/components/workspace/WorkspaceGate';

export const metadata: Metadata = { title: 'Revisions' };

export default async function RevisionHistoryPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { displayName } = await requireSession(`/circuits/${id}/history`);
  return (
    <AppShell userName={displayName}>
      <WorkspaceGate>
        <RevisionHistory circuitId={id} />
      </WorkspaceGate>
    </AppShell>
  );
}
