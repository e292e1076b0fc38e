'use client';

import { useEffect, useId, useRef, useState } from 'react';
import { useCurrentWorkspace } from '@/components/workspace/use-current-workspace';

/**
 * Shows the workspace the user is working in. Every account has exactly one workspace
 * for now, so the switch itself is present but disabled until accounts can join several.
 */
export function WorkspaceSwitcher() {
  const { data, isError } = useCurrentWorkspace();
  const [open, setOpen] = useState(false);
  const rootRef = useRef<HTMLDivElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);
  const panelId = useId();
  const noteId = useId();

  useEffect(() => {
    if (!open) return;
    function closeOnOutsidePointer(event: PointerEvent) {
      if (event.target instanceof Node && !rootRef.current?.contains(event.target)) setOpen(false);
    }
    function closeOnEscape(event: KeyboardEvent) {
      if (event.key !== 'Escape') return;
      setOpen(false);
      buttonRef.current?.focus();
    }
    document.addEventListener('pointerdown', closeOnOutsidePointer);
    document.addEventListener('keydown', closeOnEscape);
    return () => {
      document.removeEventListener('pointerdown', closeOnOutsidePointer);
      document.removeEventListener('keydown', closeOnEscape);
    };
  }, [open]);

  const name = data?.workspace.name ?? (isError ? 'Workspace unavailable' : 'Loading…');

  return (
    <div ref={rootRef} className="relative">
      <button
        ref={buttonRef}
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen((value) => !value)}
        className="flex w-full items-center gap-2 rounded-md border border-rule bg-paper px-3 py-1.5 text-left text-sm hover:bg-paper-sunk md:w-auto md:max-w-64"
        data-testid="workspace-switcher"
      >
        <span className="sr-only">Workspace: </span>
        <span className="truncate font-medium text-ink">{name}</span>
        {data ? <span className="tag ml-auto md:ml-0">{data.role}</span> : null}
        <svg
          viewBox="0 0 12 12"
          aria-hidden="true"
          focusable="false"
          className={`size-3 shrink-0 text-ink-soft transition-transform ${open ? 'rotate-180' : ''}`}
          fill="none"
          stroke="currentColor"
          strokeWidth="1.5"
        >
          <path d="m2.5 4.5 3.5 3.5 3.5-3.5" />
        </svg>
      </button>

      <div
        id={panelId}
        hidden={!open}
        className="z-20 mt-1 w-full rounded-md border border-rule bg-paper-raised p-3 shadow-lg md:absolute md:left-0 md:w-72"
      >
        <p className="text-xs font-medium uppercase tracking-wide text-ink-soft">Current workspace</p>
        <p className="mt-1 font-medium text-ink">{name}</p>
        {data ? (
          <p className="mt-0.5 text-sm text-ink-soft">
            Your role: <span className="tag">{data.role}</span>
          </p>
        ) : null}
        <div className="mt-3 border-t border-rule pt-3">
          <button
            type="button"
            disabled
            aria-describedby={noteId}
            className="w-full cursor-not-allowed rounded-md border border-rule bg-paper-sunk px-3 py-1.5 text-left text-sm text-ink-soft"
          >
            Switch workspace
          </button>
          <p id={noteId} className="mt-2 text-xs text-ink-soft">
            Switching between workspaces arrives with accounts.
          </p>
        </div>
      </div>
    </div>
  );
}
