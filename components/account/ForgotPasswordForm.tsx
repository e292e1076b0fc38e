'use client';

import { EmailField } from '@/components/forms/EmailField';
import { useMutation } from '@tanstack/react-query';
import type { FormEvent } from 'react';
import { sendJson } from '@/components/api/request-json';
import { emailProblem } from '@/components/forms/email-problem';
import { FormAlert } from '@/components/forms/FormAlert';
import { useFormErrors } from '@/components/forms/use-form-errors';
import { Button } from '@/components/ui/Button';

const FIELDS = ['email'] as const;

export function ForgotPasswordForm() {
  const { formRef, errors, showFieldErrors, showApiError } = useFormErrors(FIELDS);
  const request = useMutation({
    mutationFn: (email: string) => sendJson('POST', '/api/account/password-reset/request', { email }),
    onError: showApiError,
  });

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const email = String(new FormData(event.currentTarget).get('email') ?? '').trim();
    if (showFieldErrors({ email: emailProblem(email) ?? undefined })) return;
    request.mutate(email);
  }

  if (request.isSuccess) {
    // Worded the same whether or not the address has an account, so the page cannot be used to find accounts.
    return (
      <FormAlert tone="success">
        If an account uses <strong className="font-semibold">{request.variables}</strong>, an e-mail with a
        link to choose a new password is on its way. The link works once and expires after an hour.
      </FormAlert>
    );
  }

  return (
    <form ref={formRef} noValidate onSubmit={handleSubmit} className="space-y-5">
      <EmailField error={errors.fields.email} data-testid="forgot-email" />

      {errors.form ? <FormAlert tone="error">{errors.form}</FormAlert> : null}

      <Button type="submit" variant="primary" className="w-full" disabled={request.isPending} data-testid="forgot-submit">
        {request.isPending ? 'Sending…' : 'Send reset link'}
      </Button>
    </form>
  );
}
