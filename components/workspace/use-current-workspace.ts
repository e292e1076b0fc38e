'use client';

import { useQuery } from '@tanstack/react-query';
import { ApiError } from '@/components/api/api-error';
import { requestJson } from '@/components/api/request-json';
import type { WorkspaceRole } from './roles';

export type CurrentWorkspace = {
  workspace: { id: string; name: string };
  role: WorkspaceRole;
  /** Actions the role may take, e.g. 'circuit:create'; used only to hide controls, the server still decides. */
  permissions: string[];
};

export const currentWorkspaceKey = ['workspaces', 'current'] as const;

/** Shared by the shell and page headings, so the workspace is fetched once per page. */
export function useCurrentWorkspace() {
  return useQuery({
    queryKey: currentWorkspaceKey,
    queryFn: ({ signal }) => requestJson<CurrentWorkspace>('/api/workspaces/current', signal),
    staleTime: 5 * 60_000,
  });
}

/** An account that belongs to no workspace yet (new, or removed from its last one). */
export function isWithoutWorkspace(error: unknown): boolean {
  return error instanceof ApiError && error.code === 'forbidden:workspace';
}

/** False until the workspace has loaded, so a control never flashes up and disappears. */
export function useCan(action: string): boolean {
  const { data } = useCurrentWorkspace();
  return data?.permissions.includes(action) ?? false;
}
