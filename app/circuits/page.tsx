import type { Metadata } from 'next';
import { requireSession } from '@/components/auth/require-session';
import { CircuitsView } from '@/components/circuits/CircuitsView';
import { AppShell } from '@/components/shell/AppShell';
import { WorkspaceGate } from '@/components/workspace/WorkspaceGate';

export const metadata: Metadata = { title: 'Circuits' };

export default async function CircuitsPage() {
  const { displayName } = await requireSession('/circuits');

  return (
    <AppShell userName={displayName}>
      <WorkspaceGate>
        <CircuitsView />
      </WorkspaceGate>
    </AppShell>
  );
}
