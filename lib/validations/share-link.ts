import { z } from 'zod';

/** Share-link tokens are base64url of 32 CSPRNG bytes (43 characters); anything outside this shape cannot be one. */
export const SHARE_TOKEN_SHAPE = /^[A-Za-z0-9_-]{16,64}$/;

/** True when `value` could be a share-link token (a lookup for anything else is simply not found). */
export function isShareToken(value: string): boolean {
  return SHARE_TOKEN_SHAPE.test(value);
}

/** `?token=` of DELETE /api/v1/lessons/{id}/share-links. */
export const shareTokenQuerySchema = z.object({
  token: z
    .string({ error: 'token is required' })
    .regex(SHARE_TOKEN_SHAPE, 'token is not a share link token')
    .meta({ description: 'The link’s token (43 characters of base64url), as its url ends.' }),
});
