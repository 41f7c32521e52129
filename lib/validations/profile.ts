import { z } from 'zod';
import { uuidField } from './common';
import { speakerProfileSchema } from './system';

/** A Library Speaker profile's fields: the document's profile without its in-document id. */
export const profileFieldsSchema = speakerProfileSchema
  .omit({ id: true, libraryId: true })
  .meta({ description: 'A Speaker profile: a reusable description of a main speaker or a subwoofer (roll-offs, sensitivity, power, impedance, notes, voicing options).' });
export type ProfileFields = z.infer<typeof profileFieldsSchema>;

export const profileCreateSchema = profileFieldsSchema.extend({
  /** Where to keep it; default: the caller's personal workspace. */
  workspaceId: uuidField('workspaceId must be a workspace id')
    .optional()
    .meta({ description: 'Where to keep it (an editor or owner there); default: the caller’s personal workspace.' }),
});
export const profileUpdateSchema = profileFieldsSchema;

export const profileListQuerySchema = z.object({
  q: z.string().trim().max(100).optional().meta({ description: 'Part of the name (case-insensitive), up to 100 characters.' }),
  kind: z.enum(['main', 'sub'], { error: 'kind must be main or sub' }).optional().meta({ description: 'Only main speakers (main) or only subwoofers (sub).' }),
  workspaceId: uuidField('workspaceId must be a workspace id').optional().meta({ description: 'Only this workspace.' }),
});
export type ProfileListQuery = z.infer<typeof profileListQuerySchema>;
