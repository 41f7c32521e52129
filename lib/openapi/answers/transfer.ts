import { z } from 'zod';
import type { TransferImportAnswer } from '@/lib/data/workspace-import';
import { callerRole, rowId, type Same } from './library-parts';

/** What an import answers: what it created (counts and the new ids), what it renamed, and the people in the file. */

const count = (what: string) => z.number().int().min(0).meta({ description: `How many ${what} it created.` });

export const transferImportAnswerSchema = z
  .strictObject({
    workspaceId: rowId('The workspace imported into: the new one, or the one named.'),
    workspaceName: z.string().meta({ description: 'Its name.' }),
    created: z
      .strictObject({
        profiles: count('Speaker profiles'),
        systems: count('Systems'),
        revisions: count('System revisions'),
        measurements: count('measurements'),
        lessons: count('Lessons'),
        steps: count('Lesson Steps'),
      })
      .meta({ description: 'What was created, by kind.' }),
    systems: z.array(z.strictObject({ id: rowId('The new System.'), name: z.string().meta({ description: 'Its name.' }) })).meta({ description: 'The Systems created, in the file’s order.' }),
    lessons: z.array(z.strictObject({ id: rowId('The new Lesson.'), title: z.string().meta({ description: 'Its title.' }) })).meta({ description: 'The Lessons created, in the file’s order.' }),
    renamed: z
      .array(
        z.strictObject({
          kind: z.enum(['system', 'profile', 'lesson']).meta({ description: 'What was renamed.' }),
          from: z.string().meta({ description: 'Its name in the file.' }),
          to: z.string().meta({ description: 'Its name here: the workspace already had the one in the file, so " (imported)" was added.' }),
        }),
      )
      .meta({ description: 'Names the workspace already had, kept with " (imported)" added.' }),
    members: z
      .array(
        z.strictObject({
          email: z.string().meta({ description: 'A member of the exported workspace.' }),
          role: callerRole('Their role there.'),
          alreadyMember: z.boolean().meta({ description: 'True when they are a member here too; the others are not added: invite them.' }),
        }),
      )
      .meta({ description: 'The exported workspace’s members (none for a System file). An import never adds members.' }),
    formerMembers: z
      .array(z.string())
      .meta({ description: 'People the file credits (authors of revisions, uploaders, owners) who are not members here: their work shows "a former member".' }),
  })
  .meta({ id: 'TransferImport', description: 'What an import created.' });

// The answer schema is the type the data function returns, so the two cannot drift apart.
const _import: Same<z.output<typeof transferImportAnswerSchema>, TransferImportAnswer> = true;
void _import;
