import type { Metadata } from 'next';
import { requireSession } from '@/components/auth/require-session';
import { CircuitEditorPage } from '@/components/editor/CircuitEditorPage';
import { AppShell } from '@/components/shell/AppShell';
import { WorkspaceGate } from '@/components/workspace/WorkspaceGate';

export const metadata: Metadata = { title: 'Circuit' };

export default async function CircuitPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { displayName } = await requireSession(`/circuits/${id}`);

  return (
    <AppShell userName={displayName} width="full">
      <WorkspaceGate>
        <CircuitEditorPage circuitId={id} />
      </WorkspaceGate>
    </AppShell>
  );
}
