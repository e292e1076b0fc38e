'use client';

import { useCan, useCurrentWorkspace } from '@/components/workspace/use-current-workspace';
import { InviteMemberForm } from './InviteMemberForm';
import { MemberTable } from './MemberTable';
import { PendingInvitations } from './PendingInvitations';

export function MembersPanel({ currentEmail }: { currentEmail: string | null }) {
  const { data } = useCurrentWorkspace();
  const canManage = useCan('member:manage');

  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl">Members</h1>
        <p className="mt-1 min-h-6 text-sm text-ink-soft">
          {data ? (
            <>
              People in <span className="font-medium text-ink">{data.workspace.name}</span>
              {canManage ? null : '. Only owners can change roles or invite people.'}
            </>
          ) : null}
        </p>
      </div>

      <MemberTable canManage={canManage} currentEmail={currentEmail} />

      {canManage ? (
        <div className="grid items-start gap-6 md:grid-cols-2">
          <InviteMemberForm />
          <PendingInvitations />
        </div>
      ) : null}
    </div>
  );
}
