import { demoProfile } from '@/lib/demo/profiles';
import { lindenStreetDocument } from '@/lib/demo/systems';
import { transferImportAnswerSchema } from '@/lib/openapi/answers/transfer';
import { IMPORT_LIMIT_BYTES, systemFileSchema, workspaceFileSchema, workspaceImportQuerySchema } from '@/lib/validations/workspace-transfer';
import type { ApiOperation } from '../types';
import { EXAMPLE, systemParams, workspaceParams } from './library-common';

/**
 * Taking a workspace (or one System with its history) out as a file and bringing it in again: Seamline's own transfer
 * format (lib/validations/workspace-transfer.ts), JSON, or a zip when large.
 */

const NAME = 'Linden Street den (invented)';
const PERSON = 'installer@example.test';
const T = EXAMPLE.time;
const { id: _profileId, ...profileFields } = demoProfile('quillon-b6');
void _profileId;

const revision = (n: number, note: string | null) => ({ revision: n, name: NAME, note, createdAt: T, authorEmail: PERSON, document: lindenStreetDocument(), libraryKeys: {} });
const system = { key: 'system-1', name: NAME, revisions: [revision(1, 'created'), revision(2, 'moved the sub to the front wall')] };
const profile = { ...profileFields, name: 'Quillon B6 (invented)', key: 'profile-1', createdAt: T, updatedAt: T, createdByEmail: PERSON };
const measurement = {
  key: 'measurement-1',
  systemKey: 'system-1',
  name: 'Sofa centre: sub alone (invented)',
  seat: 'Sofa centre',
  role: 'sub',
  runLabel: null,
  sourceFormat: 'text',
  sampleRateHz: null,
  arrivalMs: null,
  impulseWindow: null,
  createdAt: T,
  createdByEmail: PERSON,
  points: { frequencyHz: [20, 25, 31.5, 40, 50, 63, 80, 100], magnitudeDb: [-6, -3, -1, 0, 1, 0, -2, -5], phaseDeg: null },
};
const head = (format: string) => ({ format, version: 1, exportedAt: T });
const workspaceFile = {
  ...head('seamline-workspace'),
  workspace: { name: 'Larkspur AV (invented)' },
  members: [{ email: PERSON, role: 'owner' }],
  profiles: [profile],
  systems: [system],
  measurements: [measurement],
  lessons: [],
};
const systemFile = { ...head('seamline-system'), system, profiles: [], measurements: [measurement] };
const imported = {
  workspaceId: EXAMPLE.workspace,
  workspaceName: 'Larkspur AV (invented)',
  created: { profiles: 1, systems: 1, revisions: 2, measurements: 1, lessons: 0, steps: 0 },
  systems: [{ id: EXAMPLE.system, name: NAME }],
  lessons: [],
  renamed: [],
  members: [{ email: PERSON, role: 'owner', alreadyMember: false }],
  formerMembers: [PERSON],
};

const FORMAT = [
  'The file: { format, version: 1, exportedAt, workspace: { name }, members: [{ email, role }], profiles, systems: [{ key, name, revisions: [{ revision, name, note, createdAt, authorEmail, document, libraryKeys }] }], measurements: [{ key, systemKey, …, points }], lessons: [{ key, title, …, steps }] }. Rows name each other by file-local keys, never by database ids.',
  'JSON while it is at most 8 MB; beyond, a zip holding workspace.json (system.json for a System file) with each measurement’s points as an entry of its own (measurements/<key>.json, named by pointsFile in place of points). Named seamline-<name>-<date>.json or .zip.',
  'Never in a file: password hashes, access tokens, invitation or reset tokens, Share links. Systems and Lessons in Recently deleted are left out.',
];
const IMPORT_RULES = [
  'The body is the file itself: application/json, or application/zip (told by its first bytes). At most 50 MB: a larger one is 413 before any of it is read. A zip may unpack to at most 128 MB in at most 20 001 entries: beyond, it is refused as a zip bomb.',
  'The whole file is validated before anything is written, each part with the schema the app uses for it (the System document, Speaker profile, Lesson and Step, measurement): a refusal is 400 naming the part and field (systems.899.revisions.0.document.room.lengthM), the first 50 issues listed and totalIssues counting them all, and nothing is created. A file of another format or version is refused by format or version alone.',
  'Everything is created in one transaction with fresh ids, keeping names, revision numbers and their order, notes, and the times in the file (revision times, when profiles, measurements and Lessons were made). People are credited by e-mail when they are members of the workspace imported into; otherwise their work shows "a former member" (listed in formerMembers).',
];

export const TRANSFER_OPERATIONS: ApiOperation[] = [
  {
    id: 'workspaces-export',
    method: 'GET',
    path: '/api/v1/workspaces/{id}/export',
    tag: 'Workspaces',
    summary: 'Downloads the whole workspace as one file: Systems with every revision and note, Lessons and Steps, Speaker profiles, measurements, and the members’ e-mails and roles.',
    notes: ['Owners only, from a browser session (the file lists the members’ e-mail addresses; an access token never acts as an owner: 403). Callers outside the workspace get 404.', ...FORMAT],
    access: 'session',
    pathParams: workspaceParams,
    answers: [{ status: 200, description: 'The file as an attachment: application/json (described here), or application/zip when large.', schema: workspaceFileSchema }],
    errors: [401, 403, 404, 429, 503],
    examples: [{ title: 'Export a workspace', pathParams: { id: EXAMPLE.workspace }, status: 200, responseExcerpt: { format: 'seamline-workspace', version: 1, workspace: { name: 'Larkspur AV (invented)' } } }],
  },
  {
    id: 'workspaces-import',
    method: 'POST',
    path: '/api/v1/workspaces/import',
    tag: 'Workspaces',
    summary: 'Creates a workspace from a workspace file (the caller its owner), or fills an existing empty one the caller owns (?workspaceId=).',
    notes: [
      'A browser session only (403 with an access token): a file can bring in a whole team’s work.',
      ...IMPORT_RULES,
      'A new workspace takes the file’s name; an existing one (?workspaceId=, owners only) must hold nothing yet, deleted Systems and Lessons included (409 otherwise, nothing changed). Members are never added from a file: the answer lists them, each with alreadyMember, so the owner can invite the others.',
    ],
    access: 'session',
    query: workspaceImportQuerySchema,
    body: { schema: workspaceFileSchema, limitBytes: IMPORT_LIMIT_BYTES },
    answers: [{ status: 201, description: 'What was created.', schema: transferImportAnswerSchema }],
    errors: [400, 401, 403, 404, 409, 413, 415, 429, 503],
    examples: [
      { title: 'Bring a workspace in as a new one', body: workspaceFile, status: 201, responseExcerpt: imported },
      {
        title: 'A file of another version: refused by its version alone, nothing created',
        body: { ...workspaceFile, version: 2 },
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'version', message: 'must be 1: this Seamline reads version 1 files (the file says 2)' }], totalIssues: 1 } },
      },
    ],
  },
  {
    id: 'systems-export-history',
    method: 'GET',
    path: '/api/v1/systems/{id}/export/history',
    tag: 'Library',
    summary: 'Downloads one System with every revision and note, the Library profiles its documents were copied from and the measurements uploaded for it.',
    notes: ['Editors and owners of its workspace (viewers and read-only tokens 403; callers outside it 404).', ...FORMAT],
    access: 'member',
    pathParams: systemParams,
    answers: [{ status: 200, description: 'The file as an attachment: application/json (described here), or application/zip when large.', schema: systemFileSchema }],
    errors: [401, 403, 404, 429, 503],
    examples: [{ title: 'Export a System with its history', pathParams: { id: EXAMPLE.system }, status: 200, responseExcerpt: { format: 'seamline-system', version: 1, system: { key: 'system-1', name: NAME } } }],
  },
  {
    id: 'workspaces-system-import',
    method: 'POST',
    path: '/api/v1/workspaces/{id}/systems/import',
    tag: 'Workspaces',
    summary: 'Brings a System file into this workspace: the System with its whole history, its profiles and its measurements.',
    notes: [
      'Editors and owners of the workspace, or a write token for it (viewers and read-only tokens 403; callers outside it 404).',
      ...IMPORT_RULES,
      'A System or Speaker profile whose name the workspace already has keeps its name with " (imported)" added (listed in renamed); nothing of the workspace changes.',
    ],
    access: 'member',
    pathParams: workspaceParams,
    body: { schema: systemFileSchema, limitBytes: IMPORT_LIMIT_BYTES },
    answers: [{ status: 201, description: 'What was created.', schema: transferImportAnswerSchema }],
    errors: [400, 401, 403, 404, 413, 415, 429, 503],
    examples: [
      {
        title: 'Bring a System in',
        pathParams: { id: EXAMPLE.workspace },
        body: systemFile,
        status: 201,
        responseExcerpt: { ...imported, created: { ...imported.created, profiles: 0 }, members: [], renamed: [{ kind: 'system', from: NAME, to: `${NAME} (imported)` }] },
      },
    ],
  },
];
