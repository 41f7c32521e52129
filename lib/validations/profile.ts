import { z } from 'zod';
import { speakerProfileSchema, type SpeakerProfile } from './system';

/** A Library Speaker profile's fields: the document's profile without its in-document id. */
export const profileFieldsSchema = speakerProfileSchema.omit({ id: true, libraryId: true });
export type ProfileFields = z.infer<typeof profileFieldsSchema>;

export const profileCreateSchema = profileFieldsSchema.extend({
  /** Where to keep it; default: the caller's personal workspace. */
  workspaceId: z.string().uuid('workspaceId must be a workspace id').optional(),
});
export const profileUpdateSchema = profileFieldsSchema;

export const profileListQuerySchema = z.object({
  q: z.string().trim().max(100).optional(),
  kind: z.enum(['main', 'sub'], { error: 'kind must be main or sub' }).optional(),
  workspaceId: z.string().uuid('workspaceId must be a workspace id').optional(),
});
export type ProfileListQuery = z.infer<typeof profileListQuerySchema>;

/** A Library profile as the System document holds it (its own short id, and where it came from). */
export function documentProfileFromLibrary(fields: ProfileFields, libraryId: string, id: string): SpeakerProfile {
  return { ...fields, id, libraryId };
}
