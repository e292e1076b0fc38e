import type { Metadata } from 'next';
import { requireSession } from '@/components/auth/require-session';
import { ReviewBoxes } from '@/components/review/ReviewBoxes';
import { AppShell } from '@/components/shell/AppShell';
import { WorkspaceGate } from '@/components/workspace/WorkspaceGate';

export const metadata: Metadata = { title: 'Reviews' };

export default async function ReviewsPage() {
  const { displayName } = await requireSession('/reviews');
  return (
    <AppShell userName={displayName}>
      <WorkspaceGate>
        <ReviewBoxes />
      </WorkspaceGate>
    </AppShell>
  );
}
