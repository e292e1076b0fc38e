'use client';

import { useRef, useState } from 'react';
import { ApiError } from '@/components/api/api-error';

export type FieldErrors<F extends string> = Partial<Record<F, string>>;

export type FormErrors<F extends string> = {
  fields: FieldErrors<F>;
  /** A problem with the form as a whole, or with a field the form does not show. */
  form: string | null;
};

const UNKNOWN_FAILURE = 'Something went wrong. Try again in a moment.';

function formErrorsFrom<F extends string>(error: unknown, fields: readonly F[]): FormErrors<F> {
  if (!(error instanceof ApiError)) return { fields: {}, form: UNKNOWN_FAILURE };
  const field = fields.find((name) => name === error.field);
  if (field) return { fields: { [field]: error.message } as FieldErrors<F>, form: null };
  return { fields: {}, form: error.message };
}

/**
 * Holds a form's field and form-level errors, fills them from the API's `{ error: { field } }`
 * answers and moves focus to the first field in error so keyboard and screen-reader users land on it.
 */
export function useFormErrors<F extends string>(fields: readonly F[]) {
  const formRef = useRef<HTMLFormElement>(null);
  const [errors, setErrors] = useState<FormErrors<F>>({ fields: {}, form: null });

  function show(next: FormErrors<F>) {
    setErrors(next);
    const first = fields.find((name) => next.fields[name]);
    const control = first ? formRef.current?.elements.namedItem(first) : null;
    if (control instanceof HTMLElement) control.focus();
  }

  return {
    formRef,
    errors,
    /**
     * Replaces any earlier errors with what the browser found before sending (an empty
     * finding clears them) and answers whether there was anything, so the caller can stop.
     */
    showFieldErrors(found: FieldErrors<F>): boolean {
      const any = fields.some((name) => found[name]);
      show({ fields: found, form: null });
      return any;
    },
    showApiError(error: unknown) {
      show(formErrorsFrom(error, fields));
    },
  };
}
