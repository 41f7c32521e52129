import { z } from 'zod';

/** The words typed to confirm deleting an account, exactly (the API and the Account page's form alike). */
export const DELETE_ACCOUNT_CONFIRMATION = 'delete my account';

/** Most workspaces one request may decide about (far more than anyone belongs to; keeps the body small). */
const MAX_DECISIONS = 100;

/** The refusal when the confirmation is not those words. */
const CONFIRM_MESSAGE = `confirm with the words “${DELETE_ACCOUNT_CONFIRMATION}”, typed exactly`;

const workspaceIdField = z.uuid({ error: 'workspaceId must be a workspace id (uuid)' }).meta({ description: 'A workspace where you are the only owner.' });

/** What happens to one workspace where the account is the only owner: handed to a member, or deleted with all it holds. */
const workspaceDecisionSchema = z.discriminatedUnion(
  'action',
  [
    z.strictObject({
      workspaceId: workspaceIdField,
      action: z.literal('transfer').meta({ description: "'transfer': the member `toUserId` becomes an owner and the workspace stays, with everything in it." }),
      toUserId: z.uuid({ error: 'choose the member who takes the workspace over' }).meta({ description: 'A current member of that workspace (any role); they become an owner.' }),
    }),
    z.strictObject({
      workspaceId: workspaceIdField,
      action: z.literal('delete').meta({ description: "'delete': the workspace goes, with every System, revision, Lesson, Step, Speaker profile, measurement, share link and membership in it." }),
    }),
  ],
  { error: "action must be 'transfer' or 'delete'" },
);

/** DELETE /api/v1/account: the password again, the typed confirmation, and a decision for every workspace only this account owns. */
export const accountDeleteSchema = z.strictObject({
  password: z
    .string({ error: 'enter your password' })
    .min(1, 'enter your password')
    .max(200, 'password must be at most 200 characters')
    .meta({ description: 'The account’s password, asked again. A wrong one is 400 on password and counts as a failed sign-in (5 in 15 minutes lock the address: 429).' }),
  confirm: z
    .string({ error: CONFIRM_MESSAGE })
    .refine((s) => s.trim().toLowerCase() === DELETE_ACCOUNT_CONFIRMATION, CONFIRM_MESSAGE)
    .meta({ description: `The words “${DELETE_ACCOUNT_CONFIRMATION}”, typed (case and surrounding spaces aside).` }),
  workspaces: z
    .array(workspaceDecisionSchema, { error: 'workspaces must be a list of decisions' })
    .max(MAX_DECISIONS, `at most ${MAX_DECISIONS} decisions`)
    .meta({
      description:
        'One decision for each workspace where you are the only owner (GET /api/v1/account/deletion-plan lists them); none for the others, which you simply leave. A missing decision is 400 naming the workspace.',
    }),
});

export type AccountDeleteInput = z.infer<typeof accountDeleteSchema>;
/** The form's values as typed (before the schema's checks). */
export type AccountDeleteFormInput = z.input<typeof accountDeleteSchema>;
