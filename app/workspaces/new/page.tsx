import type { Metadata } from 'next';
import { requireSession } from '@/components/auth/require-session';
import { AppShell } from '@/components/shell/AppShell';
import { NewWorkspaceForm } from '@/components/workspace/NewWorkspaceForm';

export const metadata: Metadata = { title: 'New workspace' };

export default async function NewWorkspacePage() {
  const { displayName } = await requireSession('/workspaces/new');

  return (
    <AppShell userName={displayName}>
      <div className="max-w-lg">
        <h1 className="text-2xl">New workspace</h1>
        <p className="mt-1 text-sm text-ink-soft">
          A workspace holds one team&rsquo;s circuits, reviews and members. You will be its owner.
        </p>
        <div className="mt-6 rounded-lg border border-rule bg-paper-raised p-5 sm:p-6">
          <NewWorkspaceForm />
        </div>
      </div>
    </AppShell>
  );
}
