'use client';

import { PersonNameField } from '@/components/forms/PersonNameField';
import { NewPasswordField } from '@/components/account/NewPasswordField';
import { useMutation } from '@tanstack/react-query';
import { signIn } from 'next-auth/react';
import type { FormEvent } from 'react';
import { newPasswordProblem } from '@/components/account/password-rules';
import { signInFailureMessage } from '@/components/auth/sign-in-failure-message';
import { FormAlert } from '@/components/forms/FormAlert';
import { useFormErrors, type FieldErrors } from '@/components/forms/use-form-errors';
import { Button } from '@/components/ui/Button';
import { TextLink } from '@/components/ui/TextLink';
import { useEnterWorkspace } from '@/components/workspace/use-enter-workspace';
import { acceptInvitation, type InvitationSummary } from './invitation-api';

const FIELDS = ['name', 'password'] as const;
type Field = (typeof FIELDS)[number];

type AcceptWithNewAccountFormProps = {
  token: string;
  invitation: InvitationSummary;
  signedInEmail: string | null;
};

/** The invited address has no account yet: accepting creates it, then signs in with it. */
export function AcceptWithNewAccountForm({ token, invitation, signedInEmail }: AcceptWithNewAccountFormProps) {
  const enterWorkspace = useEnterWorkspace();
  const { formRef, errors, showFieldErrors, showApiError } = useFormErrors(FIELDS);

  const accept = useMutation({
    mutationFn: async ({ name, password }: { name: string; password: string }) => {
      const { email } = await acceptInvitation({ token, name, password });
      return signIn('credentials', { email, password, redirect: false });
    },
    onSuccess: (result) => {
      if (result?.ok && !result.error) enterWorkspace();
    },
    onError: showApiError,
  });

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const name = String(form.get('name') ?? '').trim();
    const password = String(form.get('password') ?? '');
    const found: FieldErrors<Field> = {
      name: name ? undefined : 'Enter your name.',
      password: newPasswordProblem(password, invitation.email) ?? undefined,
    };
    if (showFieldErrors(found)) return;
    accept.mutate({ name, password });
  }

  const signInResult = accept.data;
  if (signInResult && (!signInResult.ok || signInResult.error)) {
    // The account and membership exist by now; only the automatic sign-in is missing.
    return (
      <FormAlert tone="error">
        You have joined {invitation.workspaceName}, but signing you in did not work:{' '}
        {signInFailureMessage(signInResult.error)} <TextLink href="/sign-in">Sign in</TextLink> to continue.
      </FormAlert>
    );
  }

  const busy = accept.isPending || accept.isSuccess;

  return (
    <form ref={formRef} noValidate onSubmit={handleSubmit} className="space-y-5">
      <p className="text-sm text-ink-soft">
        Create your account for <strong className="font-semibold text-ink">{invitation.email}</strong> to join.
        {signedInEmail ? ` You will be signed out of ${signedInEmail}.` : null}
      </p>
      <PersonNameField error={errors.fields.name} data-testid="invite-name" />
      <NewPasswordField name="password" label="Choose a password" error={errors.fields.password} data-testid="invite-password" />

      {errors.form ? <FormAlert tone="error">{errors.form}</FormAlert> : null}

      <Button type="submit" variant="primary" className="w-full" disabled={busy} data-testid="invite-accept">
        {busy ? 'Joining…' : 'Create account and join'}
      </Button>
    </form>
  );
}
