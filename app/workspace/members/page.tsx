import type { Metadata } from 'next';
import { requireSession } from '@/components/auth/require-session';
import { MembersPanel } from '@/components/members/MembersPanel';
import { AppShell } from '@/components/shell/AppShell';
import { WorkspaceGate } from '@/components/workspace/WorkspaceGate';

export const metadata: Metadata = { title: 'Members' };

export default async function MembersPage() {
  const { displayName, email } = await requireSession('/workspace/members');

  return (
    <AppShell userName={displayName}>
      <WorkspaceGate>
        <MembersPanel currentEmail={email} />
      </WorkspaceGate>
    </AppShell>
  );
}
