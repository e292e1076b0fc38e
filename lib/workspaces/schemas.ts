import { z } from 'zod';
import { emailSchema } from '@/lib/auth/password-policy';
import { ROLES } from '@/models/roles';

export const createWorkspaceBodySchema = z.object({ name: z.string().trim().min(2, 'at least 2 characters').max(120, 'at most 120 characters') }).strict();
export const switchWorkspaceBodySchema = z.object({ workspaceId: z.string().uuid('not a workspace id') }).strict();
export const changeRoleBodySchema = z.object({ role: z.enum(ROLES) }).strict();
export const userIdSchema = z.string().uuid('not a user id');
export const invitationIdSchema = z.string().uuid('not an invitation id');
export const createInvitationBodySchema = z.object({ email: emailSchema, role: z.enum(ROLES) }).strict();
