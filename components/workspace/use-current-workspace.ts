'use client';

import { useQuery } from '@tanstack/react-query';
import { requestJson } from '@/components/api/request-json';

export type WorkspaceRole = 'owner' | 'engineer' | 'reviewer' | 'technician' | 'viewer';

export type CurrentWorkspace = {
  workspace: { id: string; name: string };
  role: WorkspaceRole;
};

/** Shared by the shell and page headings, so the workspace is fetched once per page. */
export function useCurrentWorkspace() {
  return useQuery({
    queryKey: ['workspaces', 'current'],
    queryFn: ({ signal }) => requestJson<CurrentWorkspace>('/api/workspaces/current', signal),
    staleTime: 5 * 60_000,
  });
}
