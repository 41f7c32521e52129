import { z } from 'zod';
import { revisionParamSchema } from '@/lib/validations/library';
import { SHARE_TOKEN_SHAPE } from '@/lib/validations/share-link';

/**
 * What the Library side's operations share: path parameters (a stored row's id is a UUID; any other value names
 * nothing and is answered 404, never 400, like an id the caller may not see), error lists, access notes and the
 * invented ids of the examples.
 */

const rowId = (description: string) => z.uuid().meta({ description: `${description} Any other value: 404.` });

export const systemParams = z.object({ id: rowId('The System’s id.') });
export const systemRevisionParams = z.object({ id: rowId('The System’s id.'), revision: revisionParamSchema });
export const shareTokenParams = z.object({
  token: z.string().regex(SHARE_TOKEN_SHAPE).meta({ description: 'The share link’s token (43 characters of base64url), as its url ends. Unknown or malformed: 404.' }),
});
export const profileParams = z.object({ id: rowId('The Speaker profile’s id.') });
export const measurementParams = z.object({ id: rowId('The measurement’s id.') });
export const lessonParams = z.object({ id: rowId('The Lesson’s id.') });
export const lessonStepParams = z.object({ id: rowId('The Lesson’s id.'), stepId: rowId('The Step’s id.') });
export const workspaceParams = z.object({ id: rowId('The workspace’s id.') });
export const adminUserParams = z.object({ id: rowId('The account’s id (from GET /api/v1/admin/users).') });
export const memberParams = z.object({ id: rowId('The workspace’s id.'), userId: rowId('The member’s account id.') });
export const invitationParams = z.object({ id: rowId('The workspace’s id.'), invitationId: rowId('The invitation’s id.') });
export const invitationTokenParams = z.object({
  token: z.string().meta({ description: 'The token from the invitation link (the part after /invite/). Unknown: 404; used or expired: 400.' }),
});

/** Invented ids and tokens for the examples (the Library examples are documented, not executed). */
export const EXAMPLE = {
  system: '6b0d6f8e-3c1a-4d2b-9f4e-2a7c5e1d9b30',
  workspace: '0f1e2d3c-4b5a-4968-8776-a5b4c3d2e1f0',
  otherWorkspace: '5d6c7b8a-9f0e-4d1c-8b2a-3e4f5a6b7c8d',
  lesson: '2b7e4c19-8d3a-4f56-9a1b-c0d2e3f4a5b6',
  step: 'a1b2c3d4-e5f6-4a7b-8c9d-0e1f2a3b4c5d',
  otherStep: 'b2c3d4e5-f6a7-4b8c-9d0e-1f2a3b4c5d6e',
  measurement: '3c9a7e21-5b4d-4f60-8e1a-9d2c7b6a5f40',
  profile: '7e8f9a0b-1c2d-4e3f-a4b5-c6d7e8f9a0b1',
  user: '9a8b7c6d-5e4f-4a3b-b2c1-d0e9f8a7b6c5',
  invitation: 'c4d5e6f7-a8b9-4c0d-9e1f-2a3b4c5d6e7f',
  shareToken: 'q3JtZ2x0b2tlbl9leGFtcGxlX29ubHlfbm90X3JlYWw',
  time: '2026-12-01T12:00:00.000Z',
} as const;

/** Every route that reads workspace content: signed out, not found (or not the caller's to see), limited, database down. */
export const READ_ERRORS = [401, 404, 429, 503];
/** A read with a query string: its parameters are checked too. */
export const QUERY_READ_ERRORS = [400, 401, 404, 429, 503];
/** A JSON write: the body checked (400/413/415), the role checked (403). */
export const WRITE_ERRORS = [400, 401, 403, 404, 413, 415, 429, 503];
/** A write without a body. */
export const BODILESS_WRITE_ERRORS = [401, 403, 404, 429, 503];
/** A write that names the revision it started from: a stale one is 409. */
export const REVISION_WRITE_ERRORS = [400, 401, 403, 404, 409, 413, 415, 429, 503];

export const ACCESS_NOTE =
  'Anonymous callers get 401; callers outside the workspace get 404 (as if it did not exist); viewers, and read-only access tokens, get 403 on writes.';
export const REVISION_NOTE = 'A stale revision is 409 with error.currentRevision and changes nothing: reload, or keep your edits and save them as a copy.';
