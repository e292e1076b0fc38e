'use client';

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useId, type FormEvent } from 'react';
import { sendJson } from '@/components/api/request-json';
import { textareaClassName } from '@/components/forms/control-styles';
import { FormAlert } from '@/components/forms/FormAlert';
import { FormField } from '@/components/forms/FormField';
import { TextField } from '@/components/forms/TextField';
import { useFormErrors } from '@/components/forms/use-form-errors';
import { Button } from '@/components/ui/Button';

const FIELDS = ['title', 'description'] as const;

export type CreatedCircuit = { id: string; title: string; revision: { id: string; number: number } };
type NewCircuit = { title: string; description?: string };

type NewCircuitFormProps = {
  onCreated: (circuit: CreatedCircuit) => void;
  onCancel: () => void;
};

export function NewCircuitForm({ onCreated, onCancel }: NewCircuitFormProps) {
  const queryClient = useQueryClient();
  const { formRef, errors, showFieldErrors, showApiError } = useFormErrors(FIELDS);
  const headingId = useId();

  const create = useMutation({
    mutationFn: (circuit: NewCircuit) => sendJson<CreatedCircuit>('POST', '/api/circuits', circuit),
    onSuccess: (circuit) => {
      void queryClient.invalidateQueries({ queryKey: ['circuits'] });
      onCreated(circuit);
    },
    onError: showApiError,
  });

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const title = String(form.get('title') ?? '').trim();
    const description = String(form.get('description') ?? '').trim();
    if (showFieldErrors({ title: title ? undefined : 'Give the circuit a title.' })) return;
    create.mutate(description ? { title, description } : { title });
  }

  return (
    <form
      ref={formRef}
      noValidate
      onSubmit={handleSubmit}
      aria-labelledby={headingId}
      className="space-y-4 rounded-lg border border-rule bg-paper-raised p-4 sm:p-5"
    >
      <h2 id={headingId} className="text-base">
        New circuit
      </h2>
      <TextField
        name="title"
        label="Title"
        placeholder="e.g. Carton erector, flap fold station"
        maxLength={200}
        required
        autoFocus
        error={errors.fields.title}
        data-testid="new-circuit-title"
      />
      <FormField
        name="description"
        label="Description (optional)"
        hint="What the circuit does and where it sits on the machine."
        error={errors.fields.description}
      >
        {(control) => (
          <textarea {...control} rows={3} className={textareaClassName} data-testid="new-circuit-description" />
        )}
      </FormField>

      {errors.form ? <FormAlert tone="error">{errors.form}</FormAlert> : null}

      <div className="flex flex-wrap gap-3">
        <Button type="submit" variant="primary" disabled={create.isPending} data-testid="new-circuit-submit">
          {create.isPending ? 'Creating…' : 'Create circuit'}
        </Button>
        <Button onClick={onCancel} disabled={create.isPending}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
