import type { InvitationSummary } from './invitation-api';

export function InvitationSummaryCard({ invitation }: { invitation: InvitationSummary }) {
  return (
    <dl
      data-testid="invitation-summary"
      className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-md border border-rule bg-paper p-3 text-sm"
    >
      <dt className="text-ink-soft">Workspace</dt>
      <dd className="font-medium text-ink">{invitation.workspaceName}</dd>
      <dt className="text-ink-soft">Role</dt>
      <dd>
        <span className="tag">{invitation.role}</span>
      </dd>
      <dt className="text-ink-soft">Invited by</dt>
      <dd className="text-ink">{invitation.invitedBy}</dd>
      <dt className="text-ink-soft">For</dt>
      <dd className="break-all text-ink">{invitation.email}</dd>
    </dl>
  );
}
