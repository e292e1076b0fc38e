import { describe, expect, it } from 'vitest';
import { can, PERMISSIONS, type Action } from '@/lib/auth/policy';
import { ROLES, type Role } from '@/models/roles';

// The role table of DESIGN.md, written out independently of the policy module.
const EXPECTED: Record<Role, Action[]> = {
  owner: Object.keys(PERMISSIONS) as Action[],
  engineer: ['workspace:read', 'circuit:read', 'circuit:create', 'circuit:edit', 'circuit:run', 'comment:create', 'review:request', 'upload:create'],
  reviewer: ['workspace:read', 'circuit:read', 'circuit:run', 'comment:create', 'review:decide'],
  technician: ['workspace:read', 'circuit:read', 'circuit:run', 'comment:create', 'upload:create'],
  viewer: ['workspace:read', 'circuit:read'],
};

describe('policy', () => {
  it.each(ROLES)('grants %s exactly its actions', (role) => {
    const granted = (Object.keys(PERMISSIONS) as Action[]).filter((action) => can(role, action));
    expect(granted.sort()).toEqual([...EXPECTED[role]].sort());
  });

  it('never lets a reviewer, technician or viewer edit a circuit', () => {
    for (const role of ['reviewer', 'technician', 'viewer'] as const) {
      expect(can(role, 'circuit:edit')).toBe(false);
      expect(can(role, 'circuit:create')).toBe(false);
    }
  });
});
