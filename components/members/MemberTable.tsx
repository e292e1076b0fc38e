'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { FormAlert } from '@/components/forms/FormAlert';
import { Button } from '@/components/ui/Button';
import type { WorkspaceRole } from '@/components/workspace/roles';
import { currentWorkspaceKey } from '@/components/workspace/use-current-workspace';
import { memberChangeProblem } from './member-change-problem';
import { MemberRow } from './MemberRow';
import { changeMemberRole, fetchMembers, membersKey, removeMember, type Member } from './members-api';

type MemberTableProps = {
  /** Owners get a role list and a remove button on each row; everyone else reads. */
  canManage: boolean;
  currentEmail: string | null;
};

export function MemberTable({ canManage, currentEmail }: MemberTableProps) {
  const queryClient = useQueryClient();
  const [problem, setProblem] = useState<string | null>(null);
  const [confirmingRemoval, setConfirmingRemoval] = useState<string | null>(null);
  const members = useQuery({ queryKey: membersKey, queryFn: ({ signal }) => fetchMembers(signal) });

  async function refresh() {
    // A change to one's own role changes what the rest of the app may show.
    await Promise.all([
      queryClient.invalidateQueries({ queryKey: membersKey }),
      queryClient.invalidateQueries({ queryKey: currentWorkspaceKey }),
    ]);
  }

  const changeRole = useMutation({
    mutationFn: ({ member, role }: { member: Member; role: WorkspaceRole }) => changeMemberRole(member.userId, role),
    onMutate: () => setProblem(null),
    onSuccess: refresh,
    onError: (error, { member }) => setProblem(memberChangeProblem(error, `change the role of ${member.name}`)),
  });

  const remove = useMutation({
    mutationFn: (member: Member) => removeMember(member.userId),
    onMutate: () => setProblem(null),
    onSuccess: async () => {
      setConfirmingRemoval(null);
      await refresh();
    },
    onError: (error, member) => {
      setConfirmingRemoval(null);
      setProblem(memberChangeProblem(error, `remove ${member.name}`));
    },
  });

  if (members.isError) {
    return (
      <FormAlert tone="error">
        The member list could not be loaded. {members.error.message}{' '}
        <Button size="sm" className="ml-1" onClick={() => void members.refetch()}>
          Try again
        </Button>
      </FormAlert>
    );
  }

  return (
    <div className="space-y-3">
      {problem ? <FormAlert tone="error">{problem}</FormAlert> : null}
      <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
        <table className="w-full border-collapse text-sm" data-testid="member-table" aria-busy={members.isPending}>
          <caption className="sr-only">Members of this workspace</caption>
          <thead className="bg-paper-sunk text-xs uppercase tracking-wide text-ink-soft">
            <tr>
              <th scope="col" className="px-2.5 py-2 sm:px-4 text-left font-medium">
                Name
              </th>
              <th scope="col" className="hidden px-2.5 py-2 sm:px-4 text-left font-medium sm:table-cell">
                E-mail
              </th>
              <th scope="col" className="px-2.5 py-2 sm:px-4 text-left font-medium">
                Role
              </th>
              <th scope="col" className="hidden px-2.5 py-2 sm:px-4 text-left font-medium md:table-cell">
                Joined
              </th>
              {canManage ? (
                <th scope="col" className="px-2.5 py-2 sm:px-4 text-right font-medium">
                  <span className="sr-only">Actions</span>
                </th>
              ) : null}
            </tr>
          </thead>
          <tbody>
            {members.data ? (
              members.data.members.map((member) => (
                <MemberRow
                  key={member.userId}
                  member={member}
                  isYou={member.email.toLowerCase() === currentEmail?.toLowerCase()}
                  canManage={canManage}
                  pendingRole={
                    changeRole.isPending && changeRole.variables.member.userId === member.userId
                      ? changeRole.variables.role
                      : null
                  }
                  onRoleChange={(role) => changeRole.mutate({ member, role })}
                  confirmingRemoval={confirmingRemoval === member.userId}
                  removing={remove.isPending && remove.variables.userId === member.userId}
                  onRemoveAsk={() => setConfirmingRemoval(member.userId)}
                  onRemoveCancel={() => setConfirmingRemoval(null)}
                  onRemoveConfirm={() => remove.mutate(member)}
                />
              ))
            ) : (
              <tr>
                <td colSpan={5} className="px-4 py-6 text-center text-ink-soft">
                  Loading members…
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
    </div>
  );
}
