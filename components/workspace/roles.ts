export const WORKSPACE_ROLES = ['owner', 'engineer', 'reviewer', 'technician', 'viewer'] as const;

export type WorkspaceRole = (typeof WORKSPACE_ROLES)[number];

/** What each role is for, in a few words, so the person choosing one knows what they grant. */
export const ROLE_LABELS: Record<WorkspaceRole, string> = {
  owner: 'Owner: runs the workspace and its members',
  engineer: 'Engineer: draws and edits circuits',
  reviewer: 'Reviewer: comments on and approves revisions',
  technician: 'Technician: replays field logs',
  viewer: 'Viewer: reads only',
};
