import { useId, type InputHTMLAttributes, type ReactNode, type Ref } from 'react';

/** What a control needs so that its label, unit, hint and message are announced with it. */
export interface InspectorControlProps {
  id: string;
  'aria-invalid': true | undefined;
  'aria-describedby': string | undefined;
}

// The editor's compact controls (as in the palette and the save form), red while their field has a message.
const inspectorBoxClassName =
  'w-full min-w-0 rounded-md border border-rule bg-paper-raised px-2 text-sm text-ink placeholder:text-ink-faint ' +
  'disabled:cursor-not-allowed disabled:bg-paper-sunk aria-invalid:border-danger aria-invalid:bg-danger-soft/40';
export const inspectorInputClassName = `h-8 ${inspectorBoxClassName}`;
export const inspectorAreaClassName = `min-h-16 py-1 ${inspectorBoxClassName}`;

/** For numbers and tags, which read as data and share the mono face (see `.value` in globals.css). */
export const inspectorValueClassName = `${inspectorInputClassName} font-mono tabular-nums`;

/**
 * One inspector field: label above, the control with its unit beside it, then the message and
 * the hint. The unit is part of the label's accessible name too, so it is read with the field.
 */
export function InspectorField({
  name,
  label,
  unit,
  hint,
  error,
  children,
}: {
  /** Names the message's test id: `inspector-error-<name>`. */
  name: string;
  label: string;
  unit?: string;
  hint?: string;
  error?: string;
  children: (control: InspectorControlProps) => ReactNode;
}) {
  const id = useId();
  const errorId = `${id}-error`;
  const hintId = `${id}-hint`;
  const describedBy = [error ? errorId : null, hint ? hintId : null].filter(Boolean).join(' ');

  return (
    <div>
      <label htmlFor={id} className="block text-xs font-medium text-ink-soft">
        {label}
        {unit ? <span className="sr-only">, {unit}</span> : null}
      </label>
      <div className="mt-1 flex items-center gap-2">
        {children({ id, 'aria-invalid': error ? true : undefined, 'aria-describedby': describedBy || undefined })}
        {unit ? (
          // One width for every unit keeps the number boxes of a panel aligned.
          <span className="w-[6.5rem] shrink-0 text-sm text-ink-soft" aria-hidden="true">
            {unit}
          </span>
        ) : null}
      </div>
      {error ? (
        <p id={errorId} className="mt-1 text-xs text-danger" data-testid={`inspector-error-${name}`}>
          {error}
        </p>
      ) : null}
      {hint ? (
        <p id={hintId} className="mt-1 text-xs text-ink-faint">
          {hint}
        </p>
      ) : null}
    </div>
  );
}

/** A number typed as text (so a half-typed value or a decimal comma stays as typed until it is committed). */
export function DecimalInput({
  control,
  field,
  testId,
}: {
  control: InspectorControlProps;
  field: InputHTMLAttributes<HTMLInputElement> & { ref?: Ref<HTMLInputElement> };
  testId: string;
}) {
  return <input {...control} type="text" inputMode="decimal" autoComplete="off" {...field} className={inspectorValueClassName} data-testid={testId} />;
}
