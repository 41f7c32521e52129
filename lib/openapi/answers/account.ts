import { z } from 'zod';
import type { AccountDeletionResult } from '@/lib/data/account-deletion';
import type { AccountDeletionPlan } from '@/lib/data/account-deletion-plan';
import { callerRole, rowId, type Same } from './library-parts';

/** Answers of the account-deletion routes: the plan (what would happen) and the result (what did). */

const count = (description: string) => z.number().int().min(0).meta({ description });

const contentCountsSchema = z
  .strictObject({
    systems: count('Systems, the trashed ones included.'),
    revisions: count('Saved revisions of those Systems.'),
    lessons: count('Lessons, the trashed ones included.'),
    steps: count('Steps of those Lessons.'),
    profiles: count('Speaker profiles.'),
    measurements: count('Measurements.'),
    shareLinks: count('Share links that would stop working (revoked ones aside).'),
    members: count('The other members, who would lose access.'),
  })
  .meta({ id: 'WorkspaceContentCounts', description: 'What goes with a workspace when it is deleted.' });

const planMemberSchema = z
  .strictObject({
    userId: rowId('The member’s account (the `toUserId` of a transfer).'),
    name: z.string().meta({ description: 'Their name.' }),
    email: z.string().meta({ description: 'Their e-mail address.' }),
    role: callerRole('Their role in the workspace now.'),
  })
  .meta({ description: 'Another member of the workspace.' });

const planWorkspaceSchema = z
  .strictObject({
    workspaceId: rowId('The workspace.'),
    name: z.string().meta({ description: 'Its name.' }),
    personal: z.boolean().meta({ description: 'True for the personal workspace made with the account (handed over, it becomes an ordinary one).' }),
    role: callerRole('Your role in it.'),
    onlyOwner: z.boolean().meta({ description: 'True when you are its only owner: DELETE /api/v1/account needs a decision for it (transfer or delete). Otherwise you simply leave it.' }),
    otherMembers: z.array(planMemberSchema).meta({ description: 'Everyone else in it, in the order they joined: who it could be handed to.' }),
    ifDeleted: contentCountsSchema,
  })
  .meta({ description: 'One of your workspaces and what deleting your account would do to it.' });

export const accountDeletionPlanAnswerSchema = z
  .strictObject({
    userId: rowId('Your account.'),
    name: z.string().meta({ description: 'Your name.' }),
    email: z.string().meta({ description: 'Your e-mail address.' }),
    blockedReason: z.string().nullable().meta({ description: 'Why the account cannot be deleted now (the only site admin), or null.' }),
    accessTokens: count('Your access tokens that still work: they stop (every token of yours is deleted).'),
    pendingInvitationsSent: count('Invitations you sent that nobody accepted yet: they are withdrawn.'),
    workspaces: z.array(planWorkspaceSchema).meta({ description: 'Your workspaces: the ones you alone own first.' }),
  })
  .meta({ id: 'AccountDeletionPlan', description: 'What deleting your account would do, before anything is done.' });

const deletedWorkspaceSchema = z
  .strictObject({
    workspaceId: rowId('The workspace.'),
    name: z.string().meta({ description: 'Its name.' }),
    outcome: z.enum(['transferred', 'deleted', 'left']).meta({ description: "'transferred' (handed to toUserId, now an owner), 'deleted' (with everything in it) or 'left' (it has other owners)." }),
    toUserId: rowId('Who took it over.').nullable(),
    toName: z.string().nullable().meta({ description: 'Their name.' }),
    removed: contentCountsSchema.nullable(),
  })
  .meta({ description: 'What happened to one of your workspaces.' });

export const accountDeletionResultAnswerSchema = z
  .strictObject({
    deleted: z.literal(true).meta({ description: 'Always true: the account is gone, its sessions refused (401) from now on.' }),
    workspaces: z.array(deletedWorkspaceSchema).meta({ description: 'Each workspace you were in, and what happened to it.' }),
    accessTokens: count('Access tokens deleted (revoked and expired ones included).'),
    pendingInvitationsWithdrawn: count('Invitations you had sent that nobody accepted (expired ones included), withdrawn.'),
  })
  .meta({ id: 'AccountDeleted', description: 'The account is deleted; sign out in the browser.' });

const _plan: Same<z.output<typeof accountDeletionPlanAnswerSchema>, AccountDeletionPlan> = true;
const _result: Same<z.output<typeof accountDeletionResultAnswerSchema>, AccountDeletionResult> = true;
void [_plan, _result];
