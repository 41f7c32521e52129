import { z } from 'zod';
import type { AppAccessToken } from '@/lib/data/access-tokens';
import { isoTime, itemsOf, rowId, type Same } from './library-parts';

/** A personal access token as its owner sees it: never the secret, never its hash. */
export const accessTokenAnswerSchema = z
  .strictObject({
    id: rowId('The token (to revoke it).'),
    name: z.string().meta({ description: 'What it is for, as typed.' }),
    workspaceId: rowId('The one workspace it reaches.'),
    workspaceName: z.string().meta({ description: 'That workspace’s name.' }),
    scope: z.enum(['read', 'write']).meta({ description: "'read' (a viewer) or 'write' (the owner’s role capped at editor)." }),
    hint: z.string().meta({ description: 'The secret’s first characters and "…", to tell tokens apart; never enough to use it.' }),
    createdAt: isoTime('When it was made.'),
    expiresAt: isoTime('When it stops working; null: never.').nullable(),
    lastUsedAt: isoTime('Its last use, to the minute; null: never used.').nullable(),
    revokedAt: isoTime('When it was revoked; null: not revoked.').nullable(),
    status: z.enum(['active', 'expired', 'revoked']).meta({ description: 'As of the answer.' }),
  })
  .meta({ id: 'AccessToken', description: 'A personal access token (without its secret).' });

/** POST /api/v1/tokens: the token and, this once, its secret. */
export const createdAccessTokenAnswerSchema = accessTokenAnswerSchema
  .extend({ token: z.string().meta({ description: 'The secret ("slp_" and 43 characters). Shown only in this answer: only its SHA-256 is stored. Send it as `Authorization: Bearer <token>`.' }) })
  .meta({ id: 'CreatedAccessToken', description: 'The new token with its secret, shown once.' });

export const accessTokenListAnswerSchema = itemsOf(accessTokenAnswerSchema, 'The caller’s tokens, newest first, revoked and expired ones included.');

const _tokenMatches: Same<z.output<typeof accessTokenAnswerSchema>, AppAccessToken> = true;
const _createdMatches: Same<z.output<typeof createdAccessTokenAnswerSchema>, AppAccessToken & { token: string }> = true;
void _tokenMatches;
void _createdMatches;
