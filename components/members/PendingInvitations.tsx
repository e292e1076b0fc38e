'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useId } from 'react';
import { Button } from '@/components/ui/Button';
import { fetchInvitations, invitationsKey, revokeInvitation, type Invitation } from './members-api';

const dateFormat = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium' });

function formatDate(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? '—' : dateFormat.format(date);
}

/** Invitations still waiting for an answer; accepted, revoked and expired ones are history, not work. */
export function PendingInvitations() {
  const queryClient = useQueryClient();
  const headingId = useId();
  const invitations = useQuery({ queryKey: invitationsKey, queryFn: ({ signal }) => fetchInvitations(signal) });
  const revoke = useMutation({
    mutationFn: (invitation: Invitation) => revokeInvitation(invitation.id),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationsKey }),
  });

  const pending = invitations.data?.invitations.filter((invitation) => invitation.status === 'pending') ?? [];

  return (
    <section aria-labelledby={headingId} className="rounded-lg border border-rule bg-paper-raised p-4 sm:p-5">
      <h2 id={headingId} className="text-base">
        Pending invitations
      </h2>

      {invitations.isError ? (
        <p role="alert" className="mt-3 text-sm text-danger">
          The invitations could not be loaded. {invitations.error.message}
        </p>
      ) : invitations.isPending ? (
        <p className="mt-3 text-sm text-ink-soft">Loading invitations…</p>
      ) : pending.length === 0 ? (
        <p className="mt-3 text-sm text-ink-soft">No invitations are waiting for an answer.</p>
      ) : (
        <ul className="mt-3 divide-y divide-rule">
          {pending.map((invitation) => (
            <li
              key={invitation.id}
              data-testid="invitation-row"
              className="flex flex-wrap items-center justify-between gap-x-4 gap-y-2 py-3"
            >
              <div className="min-w-0">
                <p className="break-all font-medium text-ink">
                  {invitation.email} <span className="tag ml-1">{invitation.role}</span>
                </p>
                <p className="text-xs text-ink-soft">
                  Invited by {invitation.invitedBy} on {formatDate(invitation.createdAt)} · expires{' '}
                  {formatDate(invitation.expiresAt)}
                </p>
              </div>
              <Button
                size="sm"
                disabled={revoke.isPending}
                onClick={() => revoke.mutate(invitation)}
                aria-label={`Revoke the invitation to ${invitation.email}`}
                data-testid={`invitation-revoke-${invitation.email}`}
              >
                {revoke.isPending && revoke.variables.id === invitation.id ? 'Revoking…' : 'Revoke'}
              </Button>
            </li>
          ))}
        </ul>
      )}

      {revoke.isError ? (
        <p role="alert" className="mt-3 text-sm text-danger">
          Could not revoke the invitation to {revoke.variables.email}. {revoke.error.message}
        </p>
      ) : null}
    </section>
  );
}
