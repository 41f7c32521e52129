import { z } from 'zod';
import type { AppProfile, listProfiles } from '@/lib/data/profiles';
import { profileFieldsSchema } from '@/lib/validations/profile';
import { isoTime, rowId, type Same } from './library-parts';

/** Answers of the Speaker profile routes (delete answers `deletedAnswerSchema`). */

export const profileAnswerSchema = z
  .strictObject({
    ...profileFieldsSchema.shape,
    id: rowId('The profile.'),
    workspaceId: rowId('Its workspace.'),
    workspaceName: z.string().meta({ description: 'That workspace’s name.' }),
    createdByName: z.string().nullable().meta({ description: 'Who created it; null when that account is gone.' }),
    createdAt: isoTime('When it was created.'),
    updatedAt: isoTime('Its last change.'),
  })
  .meta({ id: 'LibraryProfile', description: 'A Library Speaker profile: its fields as sent, with its id, workspace, author and times.' });

export const profileListAnswerSchema = z.strictObject({
  items: z.array(profileAnswerSchema).meta({ description: 'The profiles, main speakers first, then by name (at most 500).' }),
  total: z.number().int().meta({ description: 'How many are listed.' }),
});

// Each answer schema is the type its data function returns, so the two cannot drift apart.
const _profile: Same<z.output<typeof profileAnswerSchema>, AppProfile> = true;
const _list: Same<z.output<typeof profileListAnswerSchema>, Awaited<ReturnType<typeof listProfiles>>> = true;
void [_profile, _list];
