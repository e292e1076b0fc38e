'use client';

import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { ApiError } from '@/components/api/api-error';
import { FormAlert } from '@/components/forms/FormAlert';
import { Button } from '@/components/ui/Button';
import { useCan, useCurrentWorkspace } from '@/components/workspace/use-current-workspace';
import { fetchMailbox, newestFirst } from './mailbox-api';
import { MailMessageList } from './MailMessageList';
import { MailMessageView } from './MailMessageView';

const OWNERS_ONLY = 'Only owners can read the local mailbox.';

function mailboxProblem(error: ApiError | Error): string {
  if (error instanceof ApiError && error.code === 'not_found:mailbox') {
    return 'No local mail catcher is configured, so there is no mailbox to read. Outgoing e-mail goes to the real mail server.';
  }
  if (error instanceof ApiError && error.status === 403) return OWNERS_ONLY;
  return `The mailbox could not be loaded. ${error.message}`;
}

/**
 * The e-mails a local mail catcher has kept instead of delivering, so sign-up, reset and
 * invitation links can be followed on a machine with no real mail server.
 */
export function MailboxPanel() {
  const workspace = useCurrentWorkspace();
  const canRead = useCan('mailbox:read');
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const mailbox = useQuery({
    queryKey: ['mailbox'],
    queryFn: ({ signal }) => fetchMailbox(signal),
    enabled: canRead,
    // New mail arrives while the page is open, typically just after another tab sent it.
    refetchInterval: 10_000,
  });

  const messages = mailbox.data ? newestFirst(mailbox.data.messages) : [];
  const selected = messages.find((message) => message.id === selectedId) ?? null;

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-2xl">Mailbox</h1>
          <p className="mt-1 text-sm text-ink-soft">E-mail caught on this machine instead of being sent.</p>
        </div>
        {canRead ? (
          <Button size="sm" onClick={() => void mailbox.refetch()} disabled={mailbox.isFetching}>
            {mailbox.isFetching ? 'Checking…' : 'Check for new mail'}
          </Button>
        ) : null}
      </div>

      {workspace.isError ? (
        <FormAlert tone="error" testId="mailbox-unavailable">
          The workspace could not be loaded. {workspace.error.message}
        </FormAlert>
      ) : workspace.data && !canRead ? (
        <FormAlert tone="error" testId="mailbox-unavailable">
          {OWNERS_ONLY}
        </FormAlert>
      ) : mailbox.isError ? (
        <FormAlert tone="error" testId="mailbox-unavailable">
          {mailboxProblem(mailbox.error)}
        </FormAlert>
      ) : !mailbox.data ? (
        <p className="text-sm text-ink-soft">Loading the mailbox…</p>
      ) : messages.length === 0 ? (
        <div className="rounded-lg border border-dashed border-rule bg-paper-raised px-6 py-12 text-center">
          <p className="font-medium text-ink">No e-mail caught yet</p>
          <p className="mt-1 text-sm text-ink-soft">
            Messages appear here when Airproof sends one, for example an invitation or a password reset link.
          </p>
        </div>
      ) : (
        <div className="grid items-start gap-4 md:grid-cols-[minmax(0,20rem)_minmax(0,1fr)]">
          <MailMessageList messages={messages} selectedId={selectedId} onSelect={setSelectedId} />
          {selected ? (
            <MailMessageView message={selected} />
          ) : (
            <p className="rounded-lg border border-dashed border-rule px-4 py-8 text-center text-sm text-ink-soft">
              Choose a message to read it.
            </p>
          )}
        </div>
      )}
    </div>
  );
}
