import { z } from 'zod';

/** Secrets look like `slp_` + base64url of 32 CSPRNG bytes; anything else cannot be one (refused without a lookup). */
export const ACCESS_TOKEN_PREFIX = 'slp_';
export const ACCESS_TOKEN_SHAPE = /^slp_[A-Za-z0-9_-]{43}$/;

/** Longest life a token may be given, in days (about ten years); no expiry is allowed too. */
export const MAX_TOKEN_DAYS = 3650;

/** POST /api/v1/tokens: a named token for one workspace, read or write, with an optional life in days. */
export const accessTokenCreateSchema = z.strictObject({
  name: z
    .string({ error: 'name is required' })
    .min(1, 'name is required')
    .max(80, 'name must be at most 80 characters')
    .refine((s) => s.trim().length > 0, 'name must not be only spaces')
    .meta({ description: 'What the token is for, 1–80 characters, stored as typed (e.g. "commissioning checklist").' }),
  workspaceId: z.uuid({ error: 'workspaceId must be a workspace id (uuid)' }).meta({ description: 'The one workspace the token reaches; you must be a member of it.' }),
  scope: z.enum(['read', 'write'], { error: "scope must be 'read' or 'write'" }).meta({
    description: "'read': acts as a viewer (never changes anything); 'write': acts with your role capped at editor (never an owner's actions).",
  }),
  expiresInDays: z
    .number({ error: 'expiresInDays must be a number of days' })
    .int('expiresInDays must be a whole number of days')
    .min(1, 'expiresInDays must be at least 1')
    .max(MAX_TOKEN_DAYS, `expiresInDays must be at most ${MAX_TOKEN_DAYS}`)
    .nullable()
    .optional()
    .meta({ description: `The token stops working this many days from now (1–${MAX_TOKEN_DAYS}); null or absent: it never expires (revoke it when it is no longer needed).` }),
});

/** `{id}` of DELETE /api/v1/tokens/{id}. */
export const accessTokenIdSchema = z.object({ id: z.uuid({ error: 'id must be a token id (uuid)' }).meta({ description: 'The token to revoke.' }) });
