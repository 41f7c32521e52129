import { z } from 'zod';
import type { acceptInvitation, InvitationPreview } from '@/lib/data/invitations';
import type { AppUser, listUsers } from '@/lib/data/users';
import { callerRole, isoTime, itemsOf, rowId, type Same } from './library-parts';

/** Answers of the account routes: sign-up, password reset, invitations by token, and the site admin's user list. */

export const signUpAnswerSchema = z
  .strictObject({
    id: rowId('The new account.'),
    email: z.string().meta({ description: 'Its e-mail address, lower-cased.' }),
    name: z.string().meta({ description: 'The name given.' }),
  })
  .meta({ description: 'The new account; its personal workspace was made with it. Sign in to use it.' });

export const resetRequestedAnswerSchema = z
  .strictObject({
    ok: z.literal(true).meta({ description: 'Always true, whether or not an account uses the address (that is not revealed).' }),
    message: z.string().meta({ description: 'What happens next, for a person.' }),
  })
  .meta({ description: 'Accepted: a reset link is on its way if an account uses that address.' });

export const invitationPreviewAnswerSchema = z
  .strictObject({
    workspaceName: z.string().meta({ description: 'The workspace the invitation is for.' }),
    email: z.string().meta({ description: 'The invited address: accepting needs a session of that account.' }),
    role: callerRole('The role accepting gives.'),
  })
  .meta({ description: 'What the invitation offers.' });

export const invitationAcceptedAnswerSchema = z
  .strictObject({
    workspaceId: rowId('The workspace joined.'),
    role: callerRole('The role in it now.'),
  })
  .meta({ description: 'The membership made (or changed to the invited role).' });

const userAnswerSchema = z
  .strictObject({
    id: rowId('The account.'),
    email: z.string().meta({ description: 'Its e-mail address.' }),
    name: z.string().meta({ description: 'The person’s name.' }),
    siteRole: z.enum(['admin', 'member']).meta({ description: 'admin: manages users (no access to workspace content by that alone); member: everyone else.' }),
    createdAt: isoTime('When the account was made.'),
    workspaceCount: z.number().int().meta({ description: 'How many workspaces it belongs to.' }),
  })
  .meta({ description: 'A user account.' });

export const userListAnswerSchema = itemsOf(userAnswerSchema, 'Every account, oldest first.');

export const siteRoleAnswerSchema = userAnswerSchema.omit({ workspaceCount: true }).meta({ description: 'The account with its site role now.' });

// Each answer schema is the type its data function (or handler) returns, so the two cannot drift apart.
const _signUp: Same<z.output<typeof signUpAnswerSchema>, Pick<AppUser, 'id' | 'email' | 'name'>> = true;
const _preview: Same<z.output<typeof invitationPreviewAnswerSchema>, InvitationPreview> = true;
const _accepted: Same<z.output<typeof invitationAcceptedAnswerSchema>, Awaited<ReturnType<typeof acceptInvitation>>> = true;
const _user: Same<z.output<typeof userAnswerSchema>, Awaited<ReturnType<typeof listUsers>>[number]> = true;
void [_signUp, _preview, _accepted, _user];
