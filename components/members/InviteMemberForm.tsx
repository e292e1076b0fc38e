'use client';

import { EmailField } from '@/components/forms/EmailField';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useId, type FormEvent } from 'react';
import { selectClassName } from '@/components/forms/control-styles';
import { emailProblem } from '@/components/forms/email-problem';
import { FormAlert } from '@/components/forms/FormAlert';
import { FormField } from '@/components/forms/FormField';
import { useFormErrors } from '@/components/forms/use-form-errors';
import { Button } from '@/components/ui/Button';
import { ROLE_LABELS, WORKSPACE_ROLES, type WorkspaceRole } from '@/components/workspace/roles';
import { invitationsKey, sendInvitation } from './members-api';

const FIELDS = ['email', 'role'] as const;

export function InviteMemberForm() {
  const queryClient = useQueryClient();
  const headingId = useId();
  const { formRef, errors, showFieldErrors, showApiError } = useFormErrors(FIELDS);

  const invite = useMutation({
    mutationFn: ({ email, role }: { email: string; role: WorkspaceRole }) => sendInvitation(email, role),
    onSuccess: () => {
      formRef.current?.reset();
      void queryClient.invalidateQueries({ queryKey: invitationsKey });
    },
    onError: showApiError,
  });

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const email = String(form.get('email') ?? '').trim();
    const role = String(form.get('role') ?? '') as WorkspaceRole;
    if (showFieldErrors({ email: emailProblem(email) ?? undefined })) return;
    invite.mutate({ email, role });
  }

  return (
    <form
      ref={formRef}
      noValidate
      onSubmit={handleSubmit}
      aria-labelledby={headingId}
      className="space-y-4 rounded-lg border border-rule bg-paper-raised p-4 sm:p-5"
    >
      <div>
        <h2 id={headingId} className="text-base">
          Invite someone
        </h2>
        <p className="mt-0.5 text-sm text-ink-soft">They get an e-mail with a link to join this workspace.</p>
      </div>
      <EmailField autoComplete="off" error={errors.fields.email} data-testid="invite-email" />
      <FormField name="role" label="Role" error={errors.fields.role}>
        {(control) => (
          <select {...control} defaultValue="engineer" className={selectClassName} data-testid="invite-role">
            {WORKSPACE_ROLES.map((role) => (
              <option key={role} value={role}>
                {ROLE_LABELS[role]}
              </option>
            ))}
          </select>
        )}
      </FormField>

      {errors.form ? <FormAlert tone="error">{errors.form}</FormAlert> : null}
      {invite.isSuccess ? (
        <FormAlert tone="success">
          Invitation sent to <strong className="font-semibold">{invite.variables.email}</strong>.
        </FormAlert>
      ) : null}

      <Button type="submit" variant="primary" disabled={invite.isPending} data-testid="invite-submit">
        {invite.isPending ? 'Sending…' : 'Send invitation'}
      </Button>
    </form>
  );
}
