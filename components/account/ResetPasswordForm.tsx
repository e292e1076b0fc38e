'use client';

import { NewPasswordField } from '@/components/account/NewPasswordField';
import { useMutation } from '@tanstack/react-query';
import type { FormEvent } from 'react';
import { ApiError } from '@/components/api/api-error';
import { sendJson } from '@/components/api/request-json';
import { FormAlert } from '@/components/forms/FormAlert';
import { useFormErrors, type FieldErrors } from '@/components/forms/use-form-errors';
import { Button } from '@/components/ui/Button';
import { ButtonLink } from '@/components/ui/ButtonLink';
import { TextLink } from '@/components/ui/TextLink';
import { confirmationProblem, newPasswordProblem } from './password-rules';

const FIELDS = ['password', 'passwordConfirm'] as const;
type Field = (typeof FIELDS)[number];

function checkFields(password: string, passwordConfirm: string): FieldErrors<Field> {
  return {
    // The e-mail is not known here; the server applies the not-your-address rule.
    password: newPasswordProblem(password, '') ?? undefined,
    passwordConfirm: confirmationProblem(password, passwordConfirm) ?? undefined,
  };
}

function isUnusableLink(error: unknown): boolean {
  return error instanceof ApiError && error.field === 'token';
}

export function ResetPasswordForm({ token }: { token: string }) {
  const { formRef, errors, showFieldErrors, showApiError } = useFormErrors(FIELDS);
  const reset = useMutation({
    mutationFn: (password: string) => sendJson('POST', '/api/account/password-reset/confirm', { token, password }),
    onError: showApiError,
  });

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const password = String(form.get('password') ?? '');
    if (showFieldErrors(checkFields(password, String(form.get('passwordConfirm') ?? '')))) return;
    reset.mutate(password);
  }

  if (reset.isSuccess) {
    return (
      <div className="space-y-4">
        <FormAlert tone="success">Your password has been changed. Sign in with the new one.</FormAlert>
        <ButtonLink href="/sign-in" variant="primary" className="w-full" data-testid="reset-done">
          Go to sign in
        </ButtonLink>
      </div>
    );
  }

  return (
    <form ref={formRef} noValidate onSubmit={handleSubmit} className="space-y-5">
      <NewPasswordField name="password" label="New password" error={errors.fields.password} data-testid="reset-password" />
      <NewPasswordField name="passwordConfirm" label="New password again" error={errors.fields.passwordConfirm} data-testid="reset-password-confirm" />

      {errors.form ? (
        <FormAlert tone="error">
          {errors.form}
          {isUnusableLink(reset.error) ? (
            <>
              {' '}
              <TextLink href="/forgot-password">Ask for a new link</TextLink>.
            </>
          ) : null}
        </FormAlert>
      ) : null}

      <Button type="submit" variant="primary" className="w-full" disabled={reset.isPending} data-testid="reset-submit">
        {reset.isPending ? 'Saving…' : 'Save new password'}
      </Button>
    </form>
  );
}
