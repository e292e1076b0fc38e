import { useId, type ReactNode } from 'react';

/** What a control needs so its label, hint and error are announced with it. */
export type FieldControlProps = {
  id: string;
  name: string;
  'aria-invalid': true | undefined;
  'aria-describedby': string | undefined;
};

type FormFieldProps = {
  /** The field's name in the form and in the API's `error.field`; also names the error's test id. */
  name: string;
  label: string;
  error?: string;
  hint?: ReactNode;
  className?: string;
  children: (control: FieldControlProps) => ReactNode;
};

/** Label above, control, hint and error below: the frame every field in every form shares. */
export function FormField({ name, label, error, hint, className, children }: FormFieldProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [hint ? hintId : null, error ? errorId : null].filter(Boolean).join(' ');

  return (
    <div className={className}>
      <label htmlFor={id} className="block text-sm font-medium text-ink">
        {label}
      </label>
      {children({
        id,
        name,
        'aria-invalid': error ? true : undefined,
        'aria-describedby': describedBy || undefined,
      })}
      {hint ? (
        <div id={hintId} className="mt-1 text-xs text-ink-soft">
          {hint}
        </div>
      ) : null}
      {error ? (
        <p id={errorId} className="mt-1 text-sm text-danger" data-testid={`field-error-${name}`}>
          {error}
        </p>
      ) : null}
    </div>
  );
}
