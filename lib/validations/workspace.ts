import { z } from 'zod';
import { emailSchema } from './auth';

export const workspaceRoleSchema = z.enum(['owner', 'editor', 'viewer'], { error: 'role must be owner, editor or viewer' });
export const workspaceNameSchema = z.string().trim().min(1, 'name is required').max(120, 'name must be at most 120 characters');
export const workspaceCreateSchema = z.object({ name: workspaceNameSchema });
export const invitationCreateSchema = z.object({ email: emailSchema, role: workspaceRoleSchema });
export const memberUpdateSchema = z.object({ role: workspaceRoleSchema });
