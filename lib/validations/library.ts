import { z } from 'zod';
import { uuidField } from './common';
import { systemDocumentSchema, systemNameSchema } from './system';

/** A revision's note ("moved subs to the front corners"): trimmed, at most 200 characters; empty means no note. */
export const REVISION_NOTE_MAX = 200;
const revisionNoteSchema = z.string({ error: 'note must be text' }).trim().max(REVISION_NOTE_MAX, `note must be at most ${REVISION_NOTE_MAX} characters`);

export const systemCreateSchema = z.object({ name: systemNameSchema, document: systemDocumentSchema, workspaceId: uuidField('workspaceId must be a workspace id').optional(), note: revisionNoteSchema.optional() });
export const systemUpdateSchema = z.object({
  name: systemNameSchema,
  document: systemDocumentSchema,
  revision: z.number({ error: 'revision must be the revision you last read' }).int().min(1),
  note: revisionNoteSchema.optional(),
});
/** PATCH /api/v1/systems/[id]/revisions/[revision]: the revision's note, changed after the fact (empty removes it). */
export const revisionNoteUpdateSchema = z.object({ note: revisionNoteSchema });
export const systemRenameSchema = z.object({ name: systemNameSchema, revision: z.number().int().min(1) });
export const systemListQuerySchema = z.object({
  q: z.string().trim().max(100).optional(),
  tag: z.string().trim().max(40).optional(),
  sort: z.enum(['name', '-name', 'updated', '-updated']).default('-updated'),
  page: z.coerce.number().int().min(1).max(10000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
  workspaceId: uuidField().optional(),
  deleted: z.enum(['0', '1']).default('0'),
});
export const copySchema = z.object({ workspaceId: uuidField('workspaceId must be a workspace id'), name: systemNameSchema.optional() });
export type SystemListQuery = z.infer<typeof systemListQuerySchema>;
export const systemDuplicateSchema = z.object({ name: systemNameSchema.optional(), workspaceId: uuidField('workspaceId must be a workspace id').optional() });
/** Restoring an old revision saves it as a new one; `revision` is the current revision the caller last read. */
export const revisionRestoreSchema = z.object({ revision: z.number({ error: 'revision must be the revision you last read' }).int().min(1) });
export const revisionParamSchema = z.coerce.number({ error: 'revision must be a whole number' }).int().min(1).max(1_000_000);
export const exportQuerySchema = z.object({ format: z.enum(['json', 'csv'], { error: 'format must be json or csv' }).default('json') });
