import { z } from 'zod';
import type { AppShareLink } from '@/lib/data/share-links';
import type { AppRevision, AppSystem, AppSystemSummary, getRevision, listSystems } from '@/lib/data/systems';
import { systemDocumentSchema } from '@/lib/validations/system';
import { callerRole, isoTime, itemsOf, rowId, type Same } from './library-parts';

/** Answers of the Systems routes (list, read, save, revisions, export) and of a System's share links. */

const systemSummaryShape = {
  id: rowId('The System.'),
  workspaceId: rowId('The workspace it belongs to.'),
  workspaceName: z.string().meta({ description: 'That workspace’s name.' }),
  name: z.string().meta({ description: 'Stored verbatim (up to 200 characters).' }),
  revision: z.number().int().meta({ description: 'The current revision; every save adds one.' }),
  tags: z.array(z.string()).meta({ description: 'The document’s tags.' }),
  ownerName: z.string().meta({ description: 'Who created it ("a former member" when that account is gone).' }),
  lastEditorName: z.string().meta({ description: 'Who saved it last ("a former member" when that account is gone).' }),
  updatedAt: isoTime('The last save.'),
  deletedAt: isoTime('When it was deleted').nullable().meta({ description: 'When it was deleted, while it is in Recently deleted; null for a live System.' }),
};

const systemSummaryAnswerSchema = z.strictObject(systemSummaryShape).meta({ id: 'SystemSummary', description: 'A System without its document.' });

export const systemAnswerSchema = z
  .strictObject({ ...systemSummaryShape, document: systemDocumentSchema, role: callerRole() })
  .meta({ id: 'System', description: 'A System with its document (SI units, the unit in every field name) and the caller’s role.' });

export const systemListAnswerSchema = z.strictObject({
  items: z.array(systemSummaryAnswerSchema).meta({ description: 'This page of Systems, without their documents.' }),
  total: z.number().int().meta({ description: 'How many match, in all pages.' }),
  page: z.number().int().meta({ description: 'The page answered, from 1.' }),
  pageSize: z.number().int().meta({ description: 'Systems per page.' }),
  tags: z.array(z.string()).meta({ description: 'Every tag of the caller’s live Systems, for a filter.' }),
});

export const revisionAnswerSchema = z
  .strictObject({
    revision: z.number().int().meta({ description: 'The revision number, from 1.' }),
    name: z.string().meta({ description: 'The System’s name in this revision.' }),
    authorName: z.string().nullable().meta({ description: 'Who saved it; null when that account is gone.' }),
    note: z.string().nullable().meta({ description: 'The note typed when saving (or set later), else "created", "renamed", "restored revision n", "copied from …"; null when none.' }),
    createdAt: isoTime('When it was saved.'),
  })
  .meta({ id: 'Revision', description: 'One saved revision, as the history lists it.' });

export const revisionListAnswerSchema = itemsOf(revisionAnswerSchema, 'Every saved revision, newest first.');

export const revisionDocumentAnswerSchema = z
  .strictObject({
    revision: z.number().int().meta({ description: 'The revision number.' }),
    name: z.string().meta({ description: 'The System’s name in this revision.' }),
    note: z.string().nullable().meta({ description: 'Its note; null when none.' }),
    document: systemDocumentSchema,
    createdAt: isoTime('When it was saved.'),
  })
  .meta({ description: 'One saved revision with its document.' });

export const systemExportAnswerSchema = z
  .strictObject({
    name: z.string().meta({ description: 'The System’s name, verbatim.' }),
    revision: z.number().int().meta({ description: 'The revision exported (the current one).' }),
    updatedAt: isoTime('When that revision was saved.'),
    document: systemDocumentSchema,
  })
  .meta({ description: 'The JSON file (?format=json), sent as an attachment named after the System and its revision.' });

export const shareLinkAnswerSchema = z
  .strictObject({
    token: z.string().meta({ description: '43 characters of base64url (256 random bits from the CSPRNG).' }),
    systemId: rowId('The System it shows.'),
    createdByName: z.string().nullable().meta({ description: 'Who created it (null when unknown, and in the answer to a revocation).' }),
    createdAt: isoTime('When it was created.'),
    revokedAt: isoTime('When it was revoked').nullable().meta({ description: 'When it was revoked; null while it is open.' }),
    url: z.string().meta({ description: 'The read-only page /s/{token}, open to anyone holding it until revoked.' }),
  })
  .meta({ id: 'SystemShareLink', description: 'A read-only link to a System.' });

export const shareLinkListAnswerSchema = itemsOf(shareLinkAnswerSchema, 'The System’s open (unrevoked) links, newest first.');

// Each answer schema is the type its data function returns, so the two cannot drift apart.
const _summary: Same<z.output<typeof systemSummaryAnswerSchema>, AppSystemSummary> = true;
const _system: Same<z.output<typeof systemAnswerSchema>, AppSystem> = true;
const _list: Same<z.output<typeof systemListAnswerSchema>, Awaited<ReturnType<typeof listSystems>> & { tags: string[] }> = true;
const _revision: Same<z.output<typeof revisionAnswerSchema>, AppRevision> = true;
const _revisionDocument: Same<z.output<typeof revisionDocumentAnswerSchema>, Awaited<ReturnType<typeof getRevision>>> = true;
const _export: Same<z.output<typeof systemExportAnswerSchema>, Pick<AppSystem, 'name' | 'revision' | 'updatedAt' | 'document'>> = true;
const _shareLink: Same<z.output<typeof shareLinkAnswerSchema>, AppShareLink> = true;
void [_summary, _system, _list, _revision, _revisionDocument, _export, _shareLink];
