import { z } from 'zod';
import { uuidField } from './common';
import { speakerProfileSchema } from './system';

/** A Library Speaker profile's fields: the document's profile without its in-document id. */
export const profileFieldsSchema = speakerProfileSchema.omit({ id: true, libraryId: true });
export type ProfileFields = z.infer<typeof profileFieldsSchema>;

export const profileCreateSchema = profileFieldsSchema.extend({
  /** Where to keep it; default: the caller's personal workspace. */
  workspaceId: uuidField('workspaceId must be a workspace id').optional(),
});
export const profileUpdateSchema = profileFieldsSchema;

export const profileListQuerySchema = z.object({
  q: z.string().trim().max(100).optional(),
  kind: z.enum(['main', 'sub'], { error: 'kind must be main or sub' }).optional(),
  workspaceId: uuidField('workspaceId must be a workspace id').optional(),
});
export type ProfileListQuery = z.infer<typeof profileListQuerySchema>;
