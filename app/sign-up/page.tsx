import type { Metadata } from 'next';
import { SignUpForm } from '@/components/account/SignUpForm';
import { AuthFrame } from '@/components/auth/AuthFrame';
import { TextLink } from '@/components/ui/TextLink';

export const metadata: Metadata = { title: 'Create an account' };

export default function SignUpPage() {
  return (
    <AuthFrame
      title="Create an account"
      intro="Start your own workspace, then invite the engineers, reviewers and technicians you work with."
      footer={
        <p>
          Already have an account? <TextLink href="/sign-in">Sign in</TextLink>
        </p>
      }
    >
      <SignUpForm />
    </AuthFrame>
  );
}
