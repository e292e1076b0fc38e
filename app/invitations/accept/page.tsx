import type { Metadata } from 'next';
import { AuthFrame } from '@/components/auth/AuthFrame';
import { signedInEmail } from '@/components/auth/require-session';
import { FormAlert } from '@/components/forms/FormAlert';
import { AcceptInvitation } from '@/components/invitations/AcceptInvitation';

export const metadata: Metadata = { title: 'Join a workspace' };

type AcceptInvitationPageProps = {
  searchParams: Promise<{ token?: string | string[] }>;
};

export default async function AcceptInvitationPage({ searchParams }: AcceptInvitationPageProps) {
  const { token } = await searchParams;
  const value = Array.isArray(token) ? token[0] : token;

  return (
    <AuthFrame title="Join a workspace" intro="You have been invited to work on circuits in Airproof.">
      {value ? (
        <AcceptInvitation token={value} signedInEmail={await signedInEmail()} />
      ) : (
        <FormAlert tone="error">
          This link is missing its invitation code. Open the link from the invitation e-mail again.
        </FormAlert>
      )}
    </AuthFrame>
  );
}
