import type { Metadata } from 'next';
import { requireSession } from '@/components/auth/require-session';
import { LogsPage } from '@/components/logs/LogsPage';
import { AppShell } from '@/components/shell/AppShell';
import { WorkspaceGate } from '@/components/workspace/WorkspaceGate';

export const metadata: Metadata = { title: 'Field logs' };

export default async function CircuitLogsPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { displayName } = await requireSession(`/circuits/${id}/logs`);
  return (
    <AppShell userName={displayName} width="full">
      <WorkspaceGate>
        <LogsPage circuitId={id} />
      </WorkspaceGate>
    </AppShell>
  );
}
