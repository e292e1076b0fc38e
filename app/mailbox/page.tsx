import type { Metadata } from 'next';
import { requireSession } from '@/components/auth/require-session';
import { MailboxPanel } from '@/components/mailbox/MailboxPanel';
import { AppShell } from '@/components/shell/AppShell';
import { WorkspaceGate } from '@/components/workspace/WorkspaceGate';

export const metadata: Metadata = { title: 'Mailbox' };

export default async function MailboxPage() {
  const { displayName } = await requireSession('/mailbox');

  return (
    <AppShell userName={displayName}>
      <WorkspaceGate>
        <MailboxPanel />
      </WorkspaceGate>
    </AppShell>
  );
}
