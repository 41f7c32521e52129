import { z } from 'zod';
import type { AppInvitation } from '@/lib/data/invitations';
import type { AppMember, AppWorkspace } from '@/lib/data/workspaces';
import { callerRole, isoTime, itemsOf, rowId, type Same } from './library-parts';

/** Answers of the workspace, member and invitation routes (member changes and revocations answer `okAnswerSchema`). */

export const workspaceAnswerSchema = z
  .strictObject({
    id: rowId('The workspace.'),
    name: z.string().meta({ description: 'Its name.' }),
    personal: z.boolean().meta({ description: 'True for the caller’s personal workspace, made with the account.' }),
    role: callerRole('The caller’s role in it.'),
    memberCount: z.number().int().meta({ description: 'How many members it has.' }),
  })
  .meta({ id: 'Workspace', description: 'A workspace the caller belongs to.' });

export const workspaceListAnswerSchema = itemsOf(workspaceAnswerSchema, 'The caller’s workspaces, the personal one first, then by name.');

const memberAnswerSchema = z
  .strictObject({
    userId: rowId('The member’s account.'),
    name: z.string().meta({ description: 'Their name.' }),
    email: z.string().meta({ description: 'Their e-mail address.' }),
    role: callerRole('Their role: owner, editor or viewer.'),
    since: isoTime('When they joined.'),
  })
  .meta({ description: 'A member of the workspace.' });

export const memberListAnswerSchema = itemsOf(memberAnswerSchema, 'The members, in the order they joined.');

export const invitationAnswerSchema = z
  .strictObject({
    id: rowId('The invitation (to revoke it).'),
    email: z.string().meta({ description: 'The invited address.' }),
    role: callerRole('The role the invitee gets on accepting.'),
    expiresAt: isoTime('When the link stops working (7 days after it was sent).'),
    createdAt: isoTime('When it was sent.'),
  })
  .meta({ id: 'Invitation', description: 'An invitation to the workspace, sent by e-mail.' });

export const invitationListAnswerSchema = itemsOf(invitationAnswerSchema, 'The pending invitations (neither accepted nor expired), newest first.');

// Each answer schema is the type its data function returns, so the two cannot drift apart.
const _workspace: Same<z.output<typeof workspaceAnswerSchema>, AppWorkspace> = true;
const _member: Same<z.output<typeof memberAnswerSchema>, AppMember> = true;
const _invitation: Same<z.output<typeof invitationAnswerSchema>, AppInvitation> = true;
void [_workspace, _member, _invitation];
