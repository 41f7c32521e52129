import { BODY_LIMIT_BYTES } from '@/lib/http';
import { deletedAnswerSchema } from '@/lib/openapi/answers/library-parts';
import { profileAnswerSchema, profileListAnswerSchema } from '@/lib/openapi/answers/profiles';
import { profileCreateSchema, profileListQuerySchema, profileUpdateSchema } from '@/lib/validations/profile';
import type { ApiOperation } from '../types';
import { ACCESS_NOTE, BODILESS_WRITE_ERRORS, EXAMPLE, profileParams, QUERY_READ_ERRORS, READ_ERRORS, WRITE_ERRORS } from './library-common';

/** Speaker profiles of the Library: list, create, read, replace, delete. */

/** An invented sealed subwoofer (the example's numbers are plausible, not any product's). */
const inventedSub = {
  name: 'Fenwick F10 (invented)',
  kind: 'sub',
  lowRolloff: { kind: 'sealed', cornerHz: 28, q: 0.65 },
  highRolloff: { kind: 'lowpass', cornerHz: 180, q: 0.7 },
  sensitivityDb: 87,
  sensitivityReference: '1W',
  ratedPowerW: 350,
  impedanceOhm: 4,
  notes: 'Invented for the example.',
};

const SYSTEMS_KEEP_COPIES = 'A System keeps its own copy of every profile it uses (profiles[] of its document): changing or deleting a Library profile changes no System.';

export const PROFILES_OPERATIONS: ApiOperation[] = [
  {
    id: 'profiles-list',
    method: 'GET',
    path: '/api/v1/profiles',
    tag: 'Profiles',
    summary: 'Speaker profiles of the caller’s workspaces, main speakers first, then by name.',
    access: 'member',
    query: profileListQuerySchema,
    answers: [{ status: 200, description: 'The profiles.', schema: profileListAnswerSchema }],
    errors: QUERY_READ_ERRORS,
    examples: [{ title: 'Subwoofer profiles', query: '?kind=sub', status: 200, responseExcerpt: { items: [{ name: 'Marrow S12 sealed sub (invented)', kind: 'sub' }], total: 1 } }],
  },
  {
    id: 'profiles-create',
    method: 'POST',
    path: '/api/v1/profiles',
    tag: 'Profiles',
    summary: 'Adds a Speaker profile to a workspace (editors and owners).',
    notes: [ACCESS_NOTE],
    access: 'member',
    body: { schema: profileCreateSchema, limitBytes: BODY_LIMIT_BYTES.profile },
    answers: [{ status: 201, description: 'The new profile.', schema: profileAnswerSchema }],
    errors: WRITE_ERRORS,
    examples: [{ title: 'An invented sealed sub', body: inventedSub, status: 201, responseExcerpt: { id: EXAMPLE.profile, name: 'Fenwick F10 (invented)', kind: 'sub', voicingOptions: [] } }],
  },
  {
    id: 'profiles-get',
    method: 'GET',
    path: '/api/v1/profiles/{id}',
    tag: 'Profiles',
    summary: 'One Speaker profile.',
    notes: [ACCESS_NOTE],
    access: 'member',
    pathParams: profileParams,
    answers: [{ status: 200, description: 'The profile.', schema: profileAnswerSchema }],
    errors: READ_ERRORS,
    examples: [{ title: 'Read a profile', pathParams: { id: EXAMPLE.profile }, status: 200, responseExcerpt: { id: EXAMPLE.profile, lowRolloff: { kind: 'sealed', cornerHz: 28, q: 0.65 } } }],
  },
  {
    id: 'profiles-replace',
    method: 'PUT',
    path: '/api/v1/profiles/{id}',
    tag: 'Profiles',
    summary: 'Replaces a Speaker profile’s fields (all of them; its workspace stays).',
    notes: [SYSTEMS_KEEP_COPIES, ACCESS_NOTE],
    access: 'member',
    pathParams: profileParams,
    body: { schema: profileUpdateSchema, limitBytes: BODY_LIMIT_BYTES.profile },
    answers: [{ status: 200, description: 'The profile as saved.', schema: profileAnswerSchema }],
    errors: WRITE_ERRORS,
    examples: [
      { title: 'A lower corner', pathParams: { id: EXAMPLE.profile }, body: { ...inventedSub, lowRolloff: { kind: 'sealed', cornerHz: 25, q: 0.65 } }, status: 200, responseExcerpt: { lowRolloff: { cornerHz: 25 } } },
    ],
  },
  {
    id: 'profiles-delete',
    method: 'DELETE',
    path: '/api/v1/profiles/{id}',
    tag: 'Profiles',
    summary: 'Deletes a Speaker profile (editors and owners).',
    notes: [SYSTEMS_KEEP_COPIES, ACCESS_NOTE],
    access: 'member',
    pathParams: profileParams,
    answers: [{ status: 200, description: 'Deleted.', schema: deletedAnswerSchema }],
    errors: BODILESS_WRITE_ERRORS,
    examples: [{ title: 'Delete', pathParams: { id: EXAMPLE.profile }, status: 200, responseExcerpt: { id: EXAMPLE.profile, deleted: true } }],
  },
];
