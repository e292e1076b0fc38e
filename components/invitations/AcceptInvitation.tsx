'use client';

import { useQuery } from '@tanstack/react-query';
import { FormAlert } from '@/components/forms/FormAlert';
import { TextLink } from '@/components/ui/TextLink';
import { AcceptAsMemberButton } from './AcceptAsMemberButton';
import { AcceptWithNewAccountForm } from './AcceptWithNewAccountForm';
import { isUnusableInvitation, lookUpInvitation, signInToAcceptUrl } from './invitation-api';
import { InvitationSummaryCard } from './InvitationSummaryCard';

type AcceptInvitationProps = {
  token: string;
  signedInEmail: string | null;
};

/** Looks the invitation up, then offers the one way to accept it that fits who is visiting. */
export function AcceptInvitation({ token, signedInEmail }: AcceptInvitationProps) {
  const lookup = useQuery({
    queryKey: ['invitation', token],
    queryFn: ({ signal }) => lookUpInvitation(token, signal),
    staleTime: Infinity,
  });

  if (lookup.isPending) return <p className="text-sm text-ink-soft">Checking the invitation…</p>;

  if (lookup.isError) {
    return (
      <FormAlert tone="error">
        {isUnusableInvitation(lookup.error)
          ? 'This invitation cannot be used. It may have expired, been accepted already or been withdrawn. Ask the workspace owner to send a new one.'
          : `The invitation could not be checked. ${lookup.error.message}`}
      </FormAlert>
    );
  }

  const invitation = lookup.data;
  const signedInAsInvitee = signedInEmail?.toLowerCase() === invitation.email.toLowerCase();

  return (
    <div className="space-y-5">
      <InvitationSummaryCard invitation={invitation} />

      {!invitation.accountExists ? (
        <AcceptWithNewAccountForm token={token} invitation={invitation} signedInEmail={signedInEmail} />
      ) : signedInAsInvitee ? (
        <AcceptAsMemberButton token={token} />
      ) : (
        <div className="space-y-3 text-sm text-ink">
          <p data-testid="invite-sign-in-needed">
            {signedInEmail ? (
              <>
                You are signed in as <strong className="font-semibold">{signedInEmail}</strong>, but this invitation
                is for <strong className="font-semibold">{invitation.email}</strong>.
              </>
            ) : (
              <>
                <strong className="font-semibold">{invitation.email}</strong> already has an Airproof account.
              </>
            )}{' '}
            Sign in as {invitation.email} to accept it.
          </p>
          <p>
            <TextLink href={signInToAcceptUrl(token)} data-testid="invite-sign-in">
              Sign in as {invitation.email}
            </TextLink>
          </p>
        </div>
      )}
    </div>
  );
}
