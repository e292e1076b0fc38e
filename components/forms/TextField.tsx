import type { InputHTMLAttributes, ReactNode } from 'react';
import { inputClassName } from './control-styles';
import { FormField } from './FormField';

type TextFieldProps = Omit<InputHTMLAttributes<HTMLInputElement>, 'name' | 'className'> & {
  name: string;
  label: string;
  error?: string;
  hint?: ReactNode;
  className?: string;
};

/** The common case of FormField: a single-line text, e-mail or password box. */
export function TextField({ name, label, error, hint, className, ...inputProps }: TextFieldProps) {
  return (
    <FormField name={name} label={label} error={error} hint={hint} className={className}>
      {(control) => <input {...inputProps} {...control} className={inputClassName} />}
    </FormField>
  );
}
