'use client';

import { useMutation } from '@tanstack/react-query';
import type { FormEvent } from 'react';
import { sendJson } from '@/components/api/request-json';
import { FormAlert } from '@/components/forms/FormAlert';
import { TextField } from '@/components/forms/TextField';
import { useFormErrors } from '@/components/forms/use-form-errors';
import { Button } from '@/components/ui/Button';
import { useEnterWorkspace } from './use-enter-workspace';

const FIELDS = ['name'] as const;

export function NewWorkspaceForm() {
  const enterWorkspace = useEnterWorkspace();
  const { formRef, errors, showFieldErrors, showApiError } = useFormErrors(FIELDS);

  const create = useMutation({
    mutationFn: (name: string) => sendJson('POST', '/api/workspaces', { name }),
    // The server makes the new workspace the active one.
    onSuccess: enterWorkspace,
    onError: showApiError,
  });

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const name = String(new FormData(event.currentTarget).get('name') ?? '').trim();
    if (showFieldErrors({ name: name ? undefined : 'Give the workspace a name.' })) return;
    create.mutate(name);
  }

  const busy = create.isPending || create.isSuccess;

  return (
    <form ref={formRef} noValidate onSubmit={handleSubmit} className="space-y-5">
      <TextField
        name="name"
        label="Workspace name"
        placeholder="e.g. Harrow Lane Packaging Works"
        autoComplete="organization"
        maxLength={120}
        required
        hint="Usually the plant, site or team whose machines you work on. You can invite people next."
        error={errors.fields.name}
        data-testid="workspace-name"
      />

      {errors.form ? <FormAlert tone="error">{errors.form}</FormAlert> : null}

      <Button type="submit" variant="primary" disabled={busy} data-testid="workspace-submit">
        {busy ? 'Creating…' : 'Create workspace'}
      </Button>
    </form>
  );
}
