/** Workspace roles, as DESIGN.md defines them; the policy module decides what each may do. */
export const ROLES = ['owner', 'engineer', 'reviewer', 'technician', 'viewer'] as const;
export type Role = (typeof ROLES)[number];
