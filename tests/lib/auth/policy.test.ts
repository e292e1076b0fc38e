import { describe, expect, it } from 'vitest';
import { can, permissionsOf, PERMISSIONS, type Action } from '@/lib/auth/policy';
import { ROLES, type Role } from '@/models/roles';

// The role table of DESIGN.md, written out independently of the policy module.
const EXPECTED: Record<Role, Action[]> = {
  owner: Object.keys(PERMISSIONS) as Action[],
  engineer: ['workspace:read', 'member:read', 'circuit:read', 'circuit:create', 'circuit:edit', 'circuit:run', 'comment:create', 'review:request', 'upload:create', 'rules:edit', 'scenario:edit', 'proof:run', 'replay:run'],
  reviewer: ['workspace:read', 'member:read', 'circuit:read', 'circuit:run', 'comment:create', 'review:decide', 'proof:run', 'replay:run'],
  technician: ['workspace:read', 'member:read', 'circuit:read', 'circuit:run', 'comment:create', 'upload:create', 'replay:run'],
  viewer: ['workspace:read', 'member:read', 'circuit:read'],
};

describe('policy', () => {
  it.each(ROLES)('grants %s exactly its actions', (role) => {
    expect([...permissionsOf(role)].sort()).toEqual([...EXPECTED[role]].sort());
  });

  it('keeps members and the local mailbox for owners', () => {
    for (const role of ROLES) {
      expect(can(role, 'member:manage')).toBe(role === 'owner');
      expect(can(role, 'mailbox:read')).toBe(role === 'owner');
    }
  });

  it('never lets a reviewer, technician or viewer edit a circuit', () => {
    for (const role of ['reviewer', 'technician', 'viewer'] as const) {
      expect(can(role, 'circuit:edit')).toBe(false);
      expect(can(role, 'circuit:create')).toBe(false);
    }
  });
});
