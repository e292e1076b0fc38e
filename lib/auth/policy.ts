import type { Role } from '@/models/roles';

/**
 * The one place that decides what a role may do. Route handlers, server actions
 * and pages ask `can` (or `assertCan`); the UI may hide controls with the same
 * answer, but the server is the gate.
 */
export const PERMISSIONS = {
  'workspace:read': ['owner', 'engineer', 'reviewer', 'technician', 'viewer'],
  'workspace:manage': ['owner'],
  'member:read': ['owner', 'engineer', 'reviewer', 'technician', 'viewer'],
  'member:manage': ['owner'],
  'mailbox:read': ['owner'],
  'circuit:read': ['owner', 'engineer', 'reviewer', 'technician', 'viewer'],
  'circuit:create': ['owner', 'engineer'],
  'circuit:edit': ['owner', 'engineer'],
  'circuit:delete': ['owner'],
  'circuit:run': ['owner', 'engineer', 'reviewer', 'technician'],
  'comment:create': ['owner', 'engineer', 'reviewer', 'technician'],
  'review:request': ['owner', 'engineer'],
  'review:decide': ['owner', 'reviewer'],
  /** Decide or withdraw any review request of the workspace, named on it or not. */
  'review:manage': ['owner'],
  'upload:create': ['owner', 'engineer', 'technician'],
  /** Rules and scenarios are read under 'circuit:read'. */
  'rules:edit': ['owner', 'engineer'],
  'scenario:edit': ['owner', 'engineer'],
  /** Start and cancel proofs; running a scenario is 'circuit:run'. */
  'proof:run': ['owner', 'engineer', 'reviewer'],
  /**
   * Map a field log's columns, replay it and search for the faults behind it (start and cancel);
   * logs, replays and searches are read under 'circuit:read'. Like 'circuit:run' it adds runs and
   * never changes the drawing: the technician has the log, the reviewer checks the explanation.
   */
  'replay:run': ['owner', 'engineer', 'reviewer', 'technician'],
} as const satisfies Record<string, readonly Role[]>;

export type Action = keyof typeof PERMISSIONS;

export function can(role: Role, action: Action): boolean {
  return (PERMISSIONS[action] as readonly Role[]).includes(role);
}

/** Every action the role may take, for the UI to hide what it cannot do. */
export function permissionsOf(role: Role): Action[] {
  return (Object.keys(PERMISSIONS) as Action[]).filter((action) => can(role, action));
}
