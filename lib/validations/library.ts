import { z } from 'zod';
import { systemDocumentSchema, systemNameSchema } from './system';

export const systemCreateSchema = z.object({ name: systemNameSchema, document: systemDocumentSchema, workspaceId: z.string().uuid('workspaceId must be a workspace id').optional() });
export const systemUpdateSchema = z.object({
  name: systemNameSchema,
  document: systemDocumentSchema,
  revision: z.number({ error: 'revision must be the revision you last read' }).int().min(1),
});
export const systemRenameSchema = z.object({ name: systemNameSchema, revision: z.number().int().min(1) });
export const systemListQuerySchema = z.object({
  q: z.string().trim().max(100).optional(),
  tag: z.string().trim().max(40).optional(),
  sort: z.enum(['name', '-name', 'updated', '-updated']).default('-updated'),
  page: z.coerce.number().int().min(1).max(10000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
  workspaceId: z.string().uuid().optional(),
  deleted: z.enum(['0', '1']).default('0'),
});
export const copySchema = z.object({ workspaceId: z.string().uuid('workspaceId must be a workspace id'), name: systemNameSchema.optional() });
export type SystemListQuery = z.infer<typeof systemListQuerySchema>;
