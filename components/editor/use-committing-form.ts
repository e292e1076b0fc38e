'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import type { KeyboardEvent } from 'react';
import { get, useForm, type FieldValues, type Path } from 'react-hook-form';
import type { z } from 'zod';
import type { CommandResult } from './inspector-commands';

/** What a field edits: how its text becomes a document value, the value it has now, and the edit that stores a new one. */
export interface CommitTarget<T> {
  schema: z.ZodType<T>;
  current: T;
  apply(value: T): CommandResult;
}

/**
 * A react-hook-form form whose fields each write to the document on their own: a text field
 * on blur or Enter, a list or tick box as soon as it changes. A value is written only when it
 * is valid and differs from the document's, so each change is one undo step and an invalid
 * one shows its message and touches nothing. `values` are the document's values as the fields
 * show them; when they change (undo, another edit) the form takes them over.
 */
export function useCommittingForm<V extends FieldValues>(schema: z.ZodType<unknown, V>, values: V, readOnly: boolean) {
  const form = useForm<V, unknown, unknown>({ resolver: zodResolver(schema), values });

  async function commit<T>(path: Path<V>, target: CommitTarget<T>) {
    if (readOnly) return;
    const raw = form.getValues(path);
    if (raw === get(values, path)) {
      form.clearErrors(path);
      return;
    }
    if (!(await form.trigger(path))) return;
    const value = target.schema.parse(raw);
    // "6.0" for 6 bar changes nothing: show the document's own text again instead of an empty undo step.
    if (Object.is(value, target.current)) {
      form.resetField(path);
      return;
    }
    const result = target.apply(value);
    if (!result.ok) form.setError(path, { type: 'command', message: result.reason });
  }

  return {
    /** Props for a text box: written on blur or Enter; Escape puts back the document's value. */
    textField<T>(path: Path<V>, target: CommitTarget<T>) {
      return {
        ...form.register(path, { onBlur: () => commit(path, target) }),
        onKeyDown(event: KeyboardEvent<HTMLInputElement>) {
          if (event.key === 'Enter') {
            event.preventDefault();
            void commit(path, target);
          } else if (event.key === 'Escape') {
            form.resetField(path);
          }
        },
      };
    },
    /** Props for a text area: written on blur (Enter starts a new line); Escape puts back the document's value. */
    areaField<T>(path: Path<V>, target: CommitTarget<T>) {
      return {
        ...form.register(path, { onBlur: () => commit(path, target) }),
        onKeyDown(event: KeyboardEvent<HTMLTextAreaElement>) {
          if (event.key === 'Escape') form.resetField(path);
        },
      };
    },
    /** Props for a list or a tick box: written as soon as it changes. */
    choiceField<T>(path: Path<V>, target: CommitTarget<T>) {
      return form.register(path, { onChange: () => commit(path, target) });
    },
    errorOf(path: Path<V>): string | undefined {
      return form.getFieldState(path, form.formState).error?.message;
    },
  };
}

export type CommittingForm<V extends FieldValues> = ReturnType<typeof useCommittingForm<V>>;
