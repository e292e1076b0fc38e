'use client';

import { useId, useState, type FormEvent } from 'react';
import { ApiError } from '@/components/api/api-error';
import { sendJson } from '@/components/api/request-json';
import { Button } from '@/components/ui/Button';
import type { CircuitDocument } from '@/engine/document/schema';

export interface SavedRevision {
  id: string;
  number: number;
  lockVersion: number;
}

/**
 * Saves the drawing as a new revision with a message. Someone else's newer revision is a
 * conflict: nothing is overwritten, the drawing stays open, and the engineer chooses when to
 * open the newer revision.
 */
export function SaveRevisionForm({
  circuitId,
  document,
  expectedLockVersion,
  onSaved,
  onCancel,
  onReloadLatest,
}: {
  circuitId: string;
  document: CircuitDocument;
  expectedLockVersion: number;
  onSaved: (revision: SavedRevision) => void;
  onCancel: () => void;
  onReloadLatest: () => void;
}) {
  const [message, setMessage] = useState('');
  const [error, setError] = useState<ApiError | null>(null);
  const [busy, setBusy] = useState(false);
  const fieldId = useId();

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    setBusy(true);
    setError(null);
    try {
      onSaved(await sendJson<SavedRevision>('POST', `/api/circuits/${circuitId}/revisions`, { document, message, expectedLockVersion }));
    } catch (cause) {
      setError(cause instanceof ApiError ? cause : new ApiError({ status: 0, code: 'unknown', message: 'The revision could not be saved.' }));
    } finally {
      setBusy(false);
    }
  };

  const conflict = error?.code === 'conflict:revision';
  const messageError = error?.field === 'message' ? error.message : null;

  return (
    <form onSubmit={submit} className="flex flex-wrap items-start gap-2 border-b border-rule bg-paper-sunk px-3 py-2" data-testid="save-form" noValidate>
      <div className="min-w-56 flex-1">
        <label htmlFor={fieldId} className="mb-1 block text-xs font-medium text-ink-soft">
          What changed?
        </label>
        <input
          id={fieldId}
          value={message}
          onChange={(e) => setMessage(e.target.value)}
          maxLength={500}
          autoFocus
          aria-invalid={messageError ? true : undefined}
          aria-describedby={messageError ? `${fieldId}-error` : undefined}
          className="h-8 w-full rounded-md border border-rule bg-paper-raised px-2 text-sm text-ink"
          placeholder="Slower extension: 1V2 throttle to 30 %"
          data-testid="save-message"
        />
        {messageError ? (
          <p id={`${fieldId}-error`} className="mt-1 text-xs text-danger" data-testid="save-message-error">
            {messageError}
          </p>
        ) : null}
      </div>
      <div className="flex gap-2 pt-5">
        <Button size="sm" variant="primary" type="submit" disabled={busy} data-testid="save-confirm">
          {busy ? 'Saving…' : 'Save'}
        </Button>
        <Button size="sm" variant="quiet" onClick={onCancel} disabled={busy}>
          Cancel
        </Button>
      </div>
      {error && !messageError ? (
        <div className="basis-full text-sm text-danger" role="alert" data-testid="save-error">
          {error.message}
          {conflict ? (
            <>
              {' '}
              Your drawing stays open here; opening the newer revision replaces it.{' '}
              <button type="button" className="font-medium text-accent underline" onClick={onReloadLatest}>
                Open the newer revision
              </button>
            </>
          ) : null}
        </div>
      ) : null}
    </form>
  );
}
