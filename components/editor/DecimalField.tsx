'use client';

import type { FieldValues, Path } from 'react-hook-form';
import { DecimalInput, InspectorField } from './InspectorField';
import type { CommitTarget, CommittingForm } from './use-committing-form';

/** A labelled number field of a committing form: its unit beside it, its message and hint below. */
export function DecimalField<V extends FieldValues, T>({
  form,
  path,
  name,
  label,
  unit,
  hint,
  target,
}: {
  form: CommittingForm<V>;
  path: Path<V>;
  /** Names the test ids: `inspector-field-<name>`, `inspector-error-<name>`. */
  name: string;
  label: string;
  unit: string;
  hint?: string;
  target: CommitTarget<T>;
}) {
  return (
    <InspectorField name={name} label={label} unit={unit} hint={hint} error={form.errorOf(path)}>
      {(control) => <DecimalInput control={control} testId={`inspector-field-${name}`} field={form.textField(path, target)} />}
    </InspectorField>
  );
}
