import { BODY_LIMIT_BYTES } from '@/lib/http';
import { accountDeletionPlanAnswerSchema, accountDeletionResultAnswerSchema } from '@/lib/openapi/answers/account';
import { accountDeleteSchema, DELETE_ACCOUNT_CONFIRMATION } from '@/lib/validations/account';
import type { ApiOperation } from '../types';
import { EXAMPLE } from './library-common';

/** Deleting one's own account: first the plan (what would happen to each workspace), then the deletion itself. */

const SESSION_ONLY = 'A browser session only: a request with an access token is answered 403 (a token never deletes its account).';
const OTHER_MEMBER = 'b3c4d5e6-f7a8-4b9c-8d0e-1f2a3b4c5d6e';
const counts = { systems: 4, revisions: 19, lessons: 1, steps: 6, profiles: 2, measurements: 11, shareLinks: 1, members: 1 };
const personal = {
  workspaceId: EXAMPLE.otherWorkspace,
  name: 'Avery’s workspace (invented)',
  personal: true,
  role: 'owner',
  onlyOwner: true,
  otherMembers: [],
  ifDeleted: { ...counts, systems: 1, revisions: 3, lessons: 0, steps: 0, profiles: 0, measurements: 0, shareLinks: 0, members: 0 },
};
const team = {
  workspaceId: EXAMPLE.workspace,
  name: 'Larkspur AV (invented)',
  personal: false,
  role: 'owner',
  onlyOwner: true,
  otherMembers: [{ userId: OTHER_MEMBER, name: 'Rowan Ellery (invented)', email: 'rowan@example.test', role: 'editor' }],
  ifDeleted: counts,
};
const decisions = [
  { workspaceId: EXAMPLE.workspace, action: 'transfer', toUserId: OTHER_MEMBER },
  { workspaceId: EXAMPLE.otherWorkspace, action: 'delete' },
];

export const ACCOUNT_OPERATIONS: ApiOperation[] = [
  {
    id: 'account-deletion-plan',
    method: 'GET',
    path: '/api/v1/account/deletion-plan',
    tag: 'Account',
    summary: 'What deleting your account would do, before anything is done: each workspace, your role, its other members, whether you are its only owner, and what would go if it were deleted.',
    notes: [SESSION_ONLY, 'Nothing changes. blockedReason says when the account cannot be deleted now (you are the only site admin).'],
    access: 'session',
    answers: [{ status: 200, description: 'The plan.', schema: accountDeletionPlanAnswerSchema }],
    errors: [401, 403, 429, 503],
    examples: [
      {
        title: 'An owner of a shared workspace and of their personal one',
        status: 200,
        responseExcerpt: { userId: EXAMPLE.user, name: 'Avery Quillfeather (invented)', email: 'avery@example.test', blockedReason: null, accessTokens: 1, pendingInvitationsSent: 0, workspaces: [team, personal] },
      },
    ],
  },
  {
    id: 'account-delete',
    method: 'DELETE',
    path: '/api/v1/account',
    tag: 'Account',
    summary: 'Deletes your account, in one transaction: each workspace you alone own is handed to a member or deleted with everything in it; the others you simply leave.',
    notes: [
      SESSION_ONLY,
      `The body asks for your password again (a wrong one is 400 on password and counts as a failed sign-in: after 5 in 15 minutes the answer is 429) and the words “${DELETE_ACCOUNT_CONFIRMATION}”.`,
      'Every workspace where you are the only owner needs one decision (GET /api/v1/account/deletion-plan lists them): transfer to one of its members, who becomes an owner, or delete it with every System, revision, Lesson, Step, Speaker profile, measurement and share link in it. A missing decision is 400 on workspaces naming the workspace; a decision for any other workspace, or a transfer to someone who is not a member, is 400 on that decision. Nothing is changed by a refused request.',
      'What you saved in the workspaces that stay (Systems, revisions, Lessons, profiles, measurements, share links) is kept, shown as by “a former member”. Your memberships, access tokens, password-reset links and the invitations you sent that are still open are deleted. Afterwards your session is refused (401) and your password signs nobody in.',
      'The only site admin cannot delete their account (409): another account must be made a site admin first (PATCH /api/v1/admin/users/{id}, or the Users page).',
    ],
    access: 'session',
    body: { schema: accountDeleteSchema, limitBytes: BODY_LIMIT_BYTES.form },
    answers: [{ status: 200, description: 'The account is deleted; what happened to each workspace.', schema: accountDeletionResultAnswerSchema }],
    errors: [400, 401, 403, 409, 413, 415, 429, 503],
    examples: [
      {
        title: 'Hand the team workspace to an editor, delete the personal one',
        body: { password: 'correct-horse-4812', confirm: DELETE_ACCOUNT_CONFIRMATION, workspaces: decisions },
        status: 200,
        responseExcerpt: {
          deleted: true,
          workspaces: [
            { workspaceId: EXAMPLE.workspace, name: team.name, outcome: 'transferred', toUserId: OTHER_MEMBER, toName: 'Rowan Ellery (invented)', removed: null },
            { workspaceId: EXAMPLE.otherWorkspace, name: personal.name, outcome: 'deleted', toUserId: null, toName: null, removed: personal.ifDeleted },
          ],
          accessTokens: 1,
          pendingInvitationsWithdrawn: 0,
        },
      },
      {
        title: 'No decision for a workspace you alone own',
        body: { password: 'correct-horse-4812', confirm: DELETE_ACCOUNT_CONFIRMATION, workspaces: [decisions[1]] },
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'workspaces', message: `decide what happens to “${team.name}” (${EXAMPLE.workspace}): you are its only owner — hand it to a member, or delete it` }] } },
      },
      {
        title: 'The confirmation not typed',
        body: { password: 'correct-horse-4812', confirm: 'yes', workspaces: decisions },
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'confirm', message: `confirm with the words “${DELETE_ACCOUNT_CONFIRMATION}”, typed exactly` }] } },
      },
    ],
  },
];
