'use client';

import { useMemo } from 'react';
import { componentTypeById } from '@/engine/components/registry';
import type { CircuitComponent, CircuitDocument } from '@/engine/document/schema';
import { parameterEditLabel, setLabel, setNotes, setParameter, setTag, type DocumentEdit } from './inspector-commands';
import { InspectorField, inspectorAreaClassName, inspectorInputClassName, inspectorValueClassName } from './InspectorField';
import { componentFormSchema, componentFormValues, effectiveParameters, tagChoices } from './parameter-form-schema';
import { ParameterField } from './ParameterField';
import { useCommittingForm } from './use-committing-form';

/** One component: what it is, its tag, label and notes, and a field for each parameter of its type. */
export function ComponentInspector({
  document,
  component,
  readOnly,
  onEdit,
}: {
  document: CircuitDocument;
  component: CircuitComponent;
  readOnly: boolean;
  onEdit: DocumentEdit;
}) {
  const type = componentTypeById(component.type);
  const schema = useMemo(() => componentFormSchema(document, component.id, type), [document, component.id, type]);
  const values = useMemo(() => componentFormValues(component, type), [component, type]);
  const form = useCommittingForm(schema, values, readOnly);
  const current = type ? effectiveParameters(component, type) : {};
  const { id, tag } = component;

  return (
    <form onSubmit={(event) => event.preventDefault()} noValidate aria-label={`${tag}, ${type?.label ?? component.type}`}>
      <header className="mb-3">
        <h2 className="text-sm font-semibold text-ink">{type?.label ?? `Unknown part type “${component.type}”`}</h2>
        <p className="mt-0.5 text-xs text-ink-soft">{type?.description ?? 'This version of Airproof does not know this part; only its tag and label can be changed.'}</p>
      </header>
      <fieldset disabled={readOnly} className="space-y-3">
        <InspectorField name="tag" label="Tag" error={form.errorOf('tag')}>
          {(control) => (
            <input
              {...control}
              type="text"
              autoComplete="off"
              {...form.textField('tag', {
                schema: schema.shape.tag,
                current: tag,
                apply: (next) => onEdit(`Rename ${tag} to ${next}`, (draft) => setTag(draft, id, next)),
              })}
              className={inspectorValueClassName}
              data-testid="inspector-tag"
            />
          )}
        </InspectorField>
        <InspectorField name="label" label="Label" hint="Optional: what the part does on the machine, such as “Clamp”." error={form.errorOf('label')}>
          {(control) => (
            <input
              {...control}
              type="text"
              autoComplete="off"
              {...form.textField('label', {
                schema: schema.shape.label,
                current: component.label ?? '',
                apply: (next) => onEdit(`Set ${tag} label`, (draft) => setLabel(draft, id, next)),
              })}
              className={inspectorInputClassName}
              data-testid="inspector-label"
            />
          )}
        </InspectorField>
        <InspectorField name="notes" label="Notes" hint="Optional: why a setting is what it is, what to check on site. Saved with the drawing." error={form.errorOf('notes')}>
          {(control) => (
            <textarea
              {...control}
              rows={3}
              {...form.areaField('notes', {
                schema: schema.shape.notes,
                current: component.notes ?? '',
                apply: (next) => onEdit(`Set ${tag} notes`, (draft) => setNotes(draft, id, next)),
              })}
              className={inspectorAreaClassName}
              data-testid="inspector-notes"
            />
          )}
        </InspectorField>
        {Object.entries(type?.parameters ?? {}).map(([name, spec]) => (
          <ParameterField
            key={name}
            name={name}
            spec={spec}
            shown={values.parameters[name]!}
            tagChoices={spec.kind === 'tag' ? tagChoices(document, spec.refers) : []}
            form={form}
            target={{
              schema: schema.shape.parameters.shape[name]!,
              current: current[name]!,
              apply: (value) => onEdit(parameterEditLabel(tag, spec), (draft) => setParameter(draft, id, name, value)),
            }}
          />
        ))}
      </fieldset>
    </form>
  );
}
