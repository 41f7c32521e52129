import { z } from 'zod';
import { emailSchema } from './auth';

export const workspaceRoleSchema = z.enum(['owner', 'editor', 'viewer'], { error: 'role must be owner, editor or viewer' });
export const workspaceNameSchema = z.string().trim().min(1, 'name is required').max(120, 'name must be at most 120 characters');
export const workspaceCreateSchema = z.object({ name: workspaceNameSchema.meta({ description: 'The workspace’s name, 1–120 characters (trimmed).' }) });
const ROLE_WORDS = 'owner (members, workspace settings), editor (create and change) or viewer (read only)';
export const invitationCreateSchema = z.object({
  email: emailSchema.meta({ description: 'The address to invite (trimmed, lower-cased); the link goes there by e-mail and is valid for 7 days.' }),
  role: workspaceRoleSchema.meta({ description: `The role the invitee gets on accepting: ${ROLE_WORDS}.` }),
});
export const memberUpdateSchema = z.object({
  role: workspaceRoleSchema.meta({ description: `The member’s new role: ${ROLE_WORDS}. The last owner cannot be demoted (409).` }),
});
