'use client';

import type { ReactNode } from 'react';
import { useCurrentWorkspace } from '@/components/workspace/use-current-workspace';

/** The page title with the workspace it lists; `action` sits opposite, e.g. the New circuit button. */
export function CircuitsHeading({ action }: { action?: ReactNode }) {
  const { data, isPending } = useCurrentWorkspace();

  return (
    <div className="flex flex-wrap items-end justify-between gap-3">
      <div>
        <h1 className="text-2xl">Circuits</h1>
        <p className="mt-1 min-h-6 text-sm text-ink-soft" data-testid="circuits-workspace">
          {data ? (
            <>
              Shared in <span className="font-medium text-ink">{data.workspace.name}</span>
            </>
          ) : isPending ? (
            <span className="inline-block h-4 w-48 animate-pulse rounded bg-paper-sunk align-middle" />
          ) : null}
        </p>
      </div>
      {action}
    </div>
  );
}
