import type { Metadata } from 'next';
import { requireSession } from '@/components/auth/require-session';
import { ComparePage } from '@/components/review/ComparePage';
import { AppShell } from '@/components/shell/AppShell';
import { WorkspaceGate } from '@/components/workspace/WorkspaceGate';

export const metadata: Metadata = { title: 'Compare revisions' };

const revision = (value: string | string[] | undefined) => {
  const n = Number(Array.isArray(value) ? value[0] : value);
  return Number.isInteger(n) && n > 0 ? n : undefined;
};

export default async function CompareRevisionsPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { id } = await params;
  const query = await searchParams;
  const review = typeof query.review === 'string' ? query.review : undefined;
  const comment = typeof query.comment === 'string' ? query.comment : undefined;
  // A reviewer following the e-mail's link while signed out comes back to the same comparison.
  const kept = new URLSearchParams(Object.entries(query).flatMap(([k, v]) => (typeof v === 'string' ? [[k, v]] : [])));
  const { displayName } = await requireSession(`/circuits/${id}/compare${kept.size ? `?${kept}` : ''}`);
  return (
    <AppShell userName={displayName} width="full">
      <WorkspaceGate>
        <ComparePage circuitId={id} from={revision(query.from)} to={revision(query.to)} reviewId={review} commentId={comment} />
      </WorkspaceGate>
    </AppShell>
  );
}
