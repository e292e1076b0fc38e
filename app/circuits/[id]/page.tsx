import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { requireSession } from '@/components/auth/require-session';
import { CircuitEditorPage } from '@/components/editor/CircuitEditorPage';
import { AppShell } from '@/components/shell/AppShell';
import { WorkspaceGate } from '@/components/workspace/WorkspaceGate';

export const metadata: Metadata = { title: 'Circuit' };

export default async function CircuitPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { id } = await params;
  // A mention's e-mail links to the comment: threads are read beside the drawing on the comparison page.
  const { comment } = await searchParams;
  if (typeof comment === 'string') redirect(`/circuits/${id}/compare?comment=${encodeURIComponent(comment)}`);
  const { displayName } = await requireSession(`/circuits/${id}`);

  return (
    <AppShell userName={displayName} width="full">
      <WorkspaceGate>
        <CircuitEditorPage circuitId={id} />
      </WorkspaceGate>
    </AppShell>
  );
}
