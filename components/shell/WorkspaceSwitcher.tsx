'use client';

import { useMutation, useQueryClient } from '@tanstack/react-query';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useEffect, useId, useRef, useState } from 'react';
import { sendJson } from '@/components/api/request-json';
import {
  isWithoutWorkspace,
  useCurrentWorkspace,
} from '@/components/workspace/use-current-workspace';
import { useWorkspaces } from '@/components/workspace/use-workspaces';
import { WorkspaceOption } from './WorkspaceOption';

/** Names the workspace being worked in and moves the user to another one they belong to. */
export function WorkspaceSwitcher() {
  const router = useRouter();
  const queryClient = useQueryClient();
  const current = useCurrentWorkspace();
  const [open, setOpen] = useState(false);
  const workspaces = useWorkspaces(open);
  const rootRef = useRef<HTMLDivElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);
  const panelId = useId();

  const switchTo = useMutation({
    mutationFn: (workspaceId: string) => sendJson('POST', '/api/workspaces/switch', { workspaceId }),
    onSuccess: () => {
      setOpen(false);
      // Everything cached was read in the old workspace; drop it rather than show it under the new name.
      void queryClient.resetQueries();
      router.refresh();
    },
  });

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

  const { data } = current;
  const name =
    data?.workspace.name ??
    (isWithoutWorkspace(current.error) ? 'No workspace' : current.isError ? 'Workspace unavailable' : 'Loading…');

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
        className="z-20 mt-1 w-full rounded-md border border-rule bg-paper-raised p-2 shadow-lg md:absolute md:left-0 md:w-80"
      >
        <p className="px-2 pt-1 text-xs font-medium uppercase tracking-wide text-ink-soft">Your workspaces</p>
        {workspaces.data ? (
          <ul className="mt-1 space-y-0.5" aria-busy={switchTo.isPending}>
            {workspaces.data.workspaces.map((workspace) => (
              <li key={workspace.id}>
                <WorkspaceOption
                  workspace={workspace}
                  switching={switchTo.isPending && switchTo.variables === workspace.id}
                  disabled={switchTo.isPending}
                  onChoose={() => (workspace.active ? setOpen(false) : switchTo.mutate(workspace.id))}
                />
              </li>
            ))}
          </ul>
        ) : (
          <p className="px-2 py-2 text-sm text-ink-soft">
            {workspaces.isError ? workspaces.error.message : 'Loading workspaces…'}
          </p>
        )}
        {switchTo.isError ? (
          <p role="alert" className="px-2 py-1 text-sm text-danger">
            {switchTo.error.message}
          </p>
        ) : null}
        <div className="mt-2 border-t border-rule pt-2">
          <Link
            href="/workspaces/new"
            onClick={() => setOpen(false)}
            className="block rounded-md px-2 py-1.5 text-sm font-medium text-accent-strong hover:bg-paper-sunk"
            data-testid="workspace-new"
          >
            New workspace…
          </Link>
        </div>
      </div>
    </div>
  );
}
