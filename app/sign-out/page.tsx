import type { Metadata } from 'next';
import { AuthFrame } from '@/components/auth/AuthFrame';
import { SignOutButton } from '@/components/shell/SignOutButton';
import { TextLink } from '@/components/ui/TextLink';

export const metadata: Metadata = { title: 'Sign out' };

export default function SignOutPage() {
  return (
    <AuthFrame
      title="Sign out of Airproof?"
      intro="Unsaved drafts stay in this browser; everything saved stays in the workspace."
      footer={
        <p>
          Changed your mind? <TextLink href="/circuits">Back to circuits</TextLink>
        </p>
      }
    >
      <SignOutButton />
    </AuthFrame>
  );
}
