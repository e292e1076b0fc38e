import { compactSelectClassName } from '@/components/forms/control-styles';
import type { ParameterSpec } from '@/engine/components/types';
import { DecimalInput, InspectorField, inspectorValueClassName } from './InspectorField';
import type { ComponentFormValues, FieldValue, ParameterValue } from './parameter-form-schema';
import { displayUnitFor } from './quantity-units';
import type { CommitTarget, CommittingForm } from './use-committing-form';

const selectClassName = `${compactSelectClassName} w-full`;

/** Option ids are written for the engine ("lever-detent"); people read words. */
const spoken = (option: string) => option.replace(/-/g, ' ');

/**
 * The control for one parameter, chosen by its spec: a number box in display units, a list of
 * choices, a tick box, or the tag of another component (a list of the circuit's fitting parts,
 * or a text box when there are none yet).
 */
export function ParameterField({
  name,
  spec,
  shown,
  tagChoices,
  form,
  target,
}: {
  name: string;
  spec: ParameterSpec;
  /** What the field shows for the document's value. */
  shown: FieldValue;
  /** For tag parameters: the tags of the circuit's components this one may name. */
  tagChoices: readonly string[];
  form: CommittingForm<ComponentFormValues>;
  target: CommitTarget<ParameterValue>;
}) {
  const path = `parameters.${name}` as const;
  const testId = `inspector-field-${name}`;
  const error = form.errorOf(path);

  if (spec.kind === 'flag') {
    return (
      <div>
        <label className="flex items-center gap-2 text-sm text-ink">
          <input type="checkbox" {...form.choiceField(path, target)} className="h-4 w-4 accent-accent" data-testid={testId} />
          {spec.label}
        </label>
        {error ? (
          <p className="mt-1 text-xs text-danger" data-testid={`inspector-error-${name}`}>
            {error}
          </p>
        ) : null}
        {spec.description ? <p className="mt-1 text-xs text-ink-faint">{spec.description}</p> : null}
      </div>
    );
  }

  const unit = spec.kind === 'number' ? displayUnitFor(spec).unit : undefined;
  return (
    <InspectorField name={name} label={spec.label} unit={unit} hint={spec.description} error={error}>
      {(control) => {
        if (spec.kind === 'number') {
          return <DecimalInput control={control} field={form.textField(path, target)} testId={testId} />;
        }
        if (spec.kind === 'choice') {
          return (
            <select {...control} {...form.choiceField(path, target)} className={selectClassName} data-testid={testId}>
              {spec.options.map((option) => (
                <option key={option} value={option}>
                  {spoken(option)}
                </option>
              ))}
            </select>
          );
        }
        if (tagChoices.length === 0) {
          return <input {...control} type="text" autoComplete="off" {...form.textField(path, target)} className={inspectorValueClassName} data-testid={testId} />;
        }
        // A tag the circuit does not have (yet) stays selectable, so showing the list never changes the value.
        const missing = typeof shown === 'string' && !tagChoices.includes(shown) ? shown : null;
        return (
          <select {...control} {...form.choiceField(path, target)} className={selectClassName} data-testid={testId}>
            {missing !== null ? <option value={missing}>{missing} (not in this circuit)</option> : null}
            {tagChoices.map((tag) => (
              <option key={tag} value={tag}>
                {tag}
              </option>
            ))}
          </select>
        );
      }}
    </InspectorField>
  );
}
