'use client';

import type { ReactNode } from 'react';
import { NoWorkspacePrompt } from './NoWorkspacePrompt';
import { isWithoutWorkspace, useCurrentWorkspace } from './use-current-workspace';

/**
 * Swaps a workspace page for the create-a-workspace prompt when the account has none.
 * Children render while the workspace loads so their own requests start in parallel.
 */
export function WorkspaceGate({ children }: { children: ReactNode }) {
  const { error } = useCurrentWorkspace();
  if (isWithoutWorkspace(error)) return <NoWorkspacePrompt />;
  return children;
}
