import { z } from 'zod';
import { uuidField } from './common';
import { systemDocumentSchema, systemNameSchema } from './system';

/** A revision's note ("moved subs to the front corners"): trimmed, at most 200 characters; empty means no note. */
export const REVISION_NOTE_MAX = 200;
const revisionNoteSchema = z.string({ error: 'note must be text' }).trim().max(REVISION_NOTE_MAX, `note must be at most ${REVISION_NOTE_MAX} characters`);
const revisionNote = (what: string) =>
  revisionNoteSchema.optional().meta({ description: `${what}: trimmed, at most ${REVISION_NOTE_MAX} characters. Shown in the revision history and on the Settings sheet; editable later (PATCH …/revisions/{revision}).` });
const lastReadRevision = (what: string) => z.number({ error: 'revision must be the revision you last read' }).int().min(1).meta({ description: what });
const targetWorkspaceId = (what: string) => uuidField('workspaceId must be a workspace id').meta({ description: what });

export const systemCreateSchema = z.object({
  name: systemNameSchema,
  document: systemDocumentSchema,
  workspaceId: targetWorkspaceId('Where to save it (an editor or owner there); default: the caller’s personal workspace.').optional(),
  note: revisionNote('Revision 1’s note (default "created")'),
});
export const systemUpdateSchema = z.object({
  name: systemNameSchema,
  document: systemDocumentSchema,
  revision: lastReadRevision('The revision the caller last read; if another save came first the answer is 409 with currentRevision and nothing changes.'),
  note: revisionNote('A short note for this revision ("moved subs to the front corners"); empty or absent: none'),
});
/** PATCH /api/v1/systems/[id]/revisions/[revision]: the revision's note, changed after the fact (empty removes it). */
export const revisionNoteUpdateSchema = z.object({
  note: revisionNoteSchema.meta({ description: `The revision’s new note: trimmed, at most ${REVISION_NOTE_MAX} characters; an empty note removes it.` }),
});
export const systemRenameSchema = z.object({
  name: systemNameSchema,
  revision: z.number().int().min(1).meta({ description: 'The revision the caller last read (stale → 409, nothing changed).' }),
});
export const systemListQuerySchema = z.object({
  q: z.string().trim().max(100).optional().meta({ description: 'Part of the name (case-insensitive; % and _ are plain characters), up to 100 characters.' }),
  tag: z.string().trim().max(40).optional().meta({ description: 'Only Systems with this tag.' }),
  sort: z.enum(['name', '-name', 'updated', '-updated']).default('-updated').meta({ description: 'Order: -updated (newest change first, the default), updated, name or -name (by name ignoring case).' }),
  page: z.coerce.number().int().min(1).max(10000).default(1).meta({ description: 'The page, from 1 (default 1).' }),
  pageSize: z.coerce.number().int().min(1).max(100).default(20).meta({ description: 'Systems per page, 1–100 (default 20).' }),
  workspaceId: uuidField().optional().meta({ description: 'Only this workspace.' }),
  deleted: z.enum(['0', '1']).default('0').meta({ description: '1 lists Recently deleted (deleted in the last 30 days, restorable) instead of the live Systems.' }),
});
export const copySchema = z.object({
  workspaceId: targetWorkspaceId('Where to put the copy: a workspace where the caller is an editor or owner (a viewer there → 403, not a member → 404).'),
  name: systemNameSchema.optional().meta({ description: 'The copy’s name, 1–200 characters; default "<name> (copy)".' }),
});
export type SystemListQuery = z.infer<typeof systemListQuerySchema>;
export const systemDuplicateSchema = z.object({
  name: systemNameSchema.optional().meta({ description: 'The copy’s name, 1–200 characters; default "<name> (copy)".' }),
  workspaceId: targetWorkspaceId('Where to put the copy; default: the same workspace (the caller must be an editor or owner there).').optional(),
});
/** Restoring an old revision saves it as a new one; `revision` is the current revision the caller last read. */
export const revisionRestoreSchema = z.object({ revision: lastReadRevision('The current revision the caller last read (stale → 409, nothing changed).') });
export const revisionParamSchema = z.coerce
  .number({ error: 'revision must be a whole number' })
  .int()
  .min(1)
  .max(1_000_000)
  .meta({ description: 'A revision number of the System (1 is the first save); any other value is 404.' });
export const exportQuerySchema = z.object({
  format: z.enum(['json', 'csv'], { error: 'format must be json or csv' }).default('json').meta({ description: 'json (the document with name, revision and updatedAt; the default) or csv (the Settings sheet).' }),
});
