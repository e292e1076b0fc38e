'use client';

import { useQuery } from '@tanstack/react-query';
import { requestJson } from '@/components/api/request-json';
import type { WorkspaceRole } from './roles';

export type WorkspaceMembership = { id: string; name: string; role: WorkspaceRole; active: boolean };

export function useWorkspaces(enabled: boolean) {
  return useQuery({
    queryKey: ['workspaces', 'list'],
    queryFn: ({ signal }) =>
      requestJson<{ workspaces: WorkspaceMembership[] }>('/api/workspaces', signal),
    enabled,
  });
}
