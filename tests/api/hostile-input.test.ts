import { appendFileSync } from 'node:fs';
import fc from 'fast-check';
import type { z } from 'zod';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { API_OPERATIONS } from '@/lib/openapi/operations';
import { addMember } from '@/lib/data/workspaces';
import { accessTokenCreateSchema } from '@/lib/validations/access-token';
import { accountDeleteSchema } from '@/lib/validations/account';
import { demoProfile } from '@/lib/demo/profiles';
import { juniperLaneDocument } from '@/lib/demo/systems';
import { isTextMediaType, MAX_MEASUREMENT_BYTES, parseMeasurementBytes } from '@/lib/measurements/parse-measurement';
import { resetConfirmSchema, resetRequestSchema, signUpSchema } from '@/lib/validations/auth';
import { siteRoleUpdateSchema } from '@/lib/validations/site-role';
import { blendRequestSchema, crossoverSweepRequestSchema, timingRequestSchema } from '@/lib/validations/compute-blend';
import { headroomRequestSchema } from '@/lib/validations/compute-headroom';
import { layoutRequestSchema } from '@/lib/validations/compute-layout';
import { roomModesRequestSchema, roomResponseRequestSchema } from '@/lib/validations/compute-room';
import { seatBalanceMeasuredRequestSchema, seatBalanceModelRequestSchema } from '@/lib/validations/compute-seat-balance';
import { lessonCreateSchema, lessonUpdateSchema, stepCreateSchema, stepReorderSchema, stepUpdateSchema } from '@/lib/validations/lesson';
import { copySchema, revisionNoteUpdateSchema, revisionRestoreSchema, systemCreateSchema, systemDuplicateSchema, systemRenameSchema, systemUpdateSchema } from '@/lib/validations/library';
import { measurementLabelsSchema, measurementUploadFieldsSchema, predictRequestSchema } from '@/lib/validations/measurement';
import { extensionRequestSchema } from '@/lib/validations/measured-extension';
import { compareRequestSchema } from '@/lib/validations/measured-compare';
import { eqDesignCurveRequestSchema, eqDesignMeasuredRequestSchema, eqDesignModelRequestSchema } from '@/lib/validations/compute-eq-design';
import { processorFiltersRequestSchema } from '@/lib/validations/compute-processor-filters';
import { profileCreateSchema, profileUpdateSchema } from '@/lib/validations/profile';
import { invitationCreateSchema, memberUpdateSchema, workspaceCreateSchema } from '@/lib/validations/workspace';
import { systemFileSchema, workspaceFileSchema } from '@/lib/validations/workspace-transfer';
import { apiRouteFiles } from '../helpers/api-routes';
import { baseUrl } from '../helpers/env';
import { testDb } from '../helpers/db';
import { tableStates, type TableState } from '../helpers/table-states';
import { Client, sessionCookie, uniqueEmail } from '../helpers/http';
import { smallSystemFile, smallWorkspaceFile } from '../helpers/transfer';

/**
 * Hostile input (issue 8): fast-check generates malformed bodies for every JSON route in app/api —
 * wrong types, missing fields, huge numbers, NaN and Infinity spelled every way, deep nesting,
 * 1 MB strings, prototype-pollution keys at every level, unknown fields, empty and non-JSON
 * bodies, wrong media types — and every one must be answered 400, 413 or 415 with a JSON error
 * (never a 500, never a 2xx, never a stack trace). Measurement uploads get truncated, binary,
 * mislabelled and oversized files. Afterwards every table holds exactly the rows it held before.
 *
 * Every body sent is certainly invalid: each generated body is first checked against the route's
 * own rules (media type, size limit, JSON syntax, the route's zod schema) and one those rules
 * would accept is not sent (and counted as such). So a 2xx is always a bug, never bad luck.
 */

const BODIES_PER_ROUTE = Number(process.env.HOSTILE_BODIES_PER_ROUTE ?? 600);
const UPLOADS = Number(process.env.HOSTILE_UPLOADS ?? 300);
const IN_FLIGHT = 16;
const SEED = Number(process.env.HOSTILE_SEED ?? 20_240_808);
const MARK = `hostile${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;
/** Tables the check leaves out: sign-in counters, the dev mailbox and the migration log. */
const UNWATCHED = new Set(['rate_limits', 'dev_messages', 'umzug_meta']);
/** `npm test` gives a private database: there any change is a failure. Elsewhere see `unchangedCheck`. */
const PRIVATE_DB = Boolean(process.env.SEAMLINE_TEST_DATA_DIR) || process.env.HOSTILE_STRICT_DB === '1';

// ---------------------------------------------------------------- the JSON routes and their rules

interface Fixture {
  cookie: string;
  /** A site administrator's session, for the admin routes (anyone else is 404 before the body is read). */
  adminCookie: string;
  workspaceId: string;
  editorId: string;
  systemId: string;
  systemRevision: number;
  lessonId: string;
  lessonRevision: number;
  stepIds: string[];
  profileId: string;
  shareToken: string;
  measurementId: string;
  /** Every id the fixture made, to tell our rows from others' on a shared database. */
  ids: string[];
}

interface JsonRoute {
  method: 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  /** The route as in app/api, `[param]` segments kept. */
  route: string;
  path: (f: Fixture) => string;
  schema: z.ZodType;
  /** parseJson's limit on that route. */
  limitBytes: number;
  /** A valid body: the API page's working example or one built like the access matrix does. */
  template: (f: Fixture) => unknown;
  /** Sent with the fixture owner's session cookie (true), a site admin's ('admin'), or none (false). */
  session: boolean | 'admin';
  /** POST /systems/{id}/duplicate takes no body at all as "no options". */
  bodyOptional?: boolean;
}

const KB = 1024;
const documented = (routePath: string) => () => {
  const op = API_OPERATIONS.find((o) => o.method === 'POST' && o.path === routePath);
  const example = op?.examples.find((e) => e.status === 200);
  if (!example) throw new Error(`the API page has no working example for POST ${routePath}`);
  return structuredClone(example.body);
};
const compute = (p: string, schema: z.ZodType, limitBytes = 256 * KB): JsonRoute => ({
  method: 'POST',
  route: p,
  path: () => p,
  schema,
  limitBytes,
  template: documented(p),
  session: false,
});
const profileFields = () => {
  const { id: _id, ...fields } = demoProfile('quillon-b6');
  void _id;
  return { ...fields, name: `Profile ${MARK} (invented)` };
};

const JSON_ROUTES: JsonRoute[] = [
  { method: 'POST', route: '/api/v1/auth/sign-up', path: () => '/api/v1/auth/sign-up', schema: signUpSchema, limitBytes: 16 * KB, session: false, template: () => ({ name: `Person ${MARK}`, email: `${MARK}@example.test`, password: 'a-long-password-1' }) },
  { method: 'POST', route: '/api/v1/auth/password-reset', path: () => '/api/v1/auth/password-reset', schema: resetRequestSchema, limitBytes: 16 * KB, session: false, template: () => ({ email: `${MARK}-reset@example.test` }) },
  { method: 'POST', route: '/api/v1/auth/password-reset/confirm', path: () => '/api/v1/auth/password-reset/confirm', schema: resetConfirmSchema, limitBytes: 16 * KB, session: false, template: () => ({ token: 'x'.repeat(43), password: 'a-long-password-1' }) },

  compute('/api/v1/blend', blendRequestSchema),
  compute('/api/v1/crossover-sweep', crossoverSweepRequestSchema, 2 * KB * KB),
  compute('/api/v1/timing', timingRequestSchema, 2 * KB * KB),
  compute('/api/v1/room-modes', roomModesRequestSchema),
  compute('/api/v1/room-response', roomResponseRequestSchema),
  // A body with `measurements` is read by the measured schema, any other by the model's.
  compute('/api/v1/seat-balance', seatBalanceModelRequestSchema.or(seatBalanceMeasuredRequestSchema)),
  compute('/api/v1/layout', layoutRequestSchema),
  compute('/api/v1/headroom', headroomRequestSchema),
  compute('/api/v1/measured/predict', predictRequestSchema, 2 * KB * KB),
  compute('/api/v1/measured/extension', extensionRequestSchema, 2 * KB * KB),
  compute('/api/v1/measured/compare', compareRequestSchema, 2 * KB * KB),
  compute('/api/v1/processor-filters', processorFiltersRequestSchema),
  compute('/api/v1/eq-design', eqDesignCurveRequestSchema.or(eqDesignModelRequestSchema).or(eqDesignMeasuredRequestSchema)),

  { method: 'POST', route: '/api/v1/tokens', path: () => '/api/v1/tokens', schema: accessTokenCreateSchema, limitBytes: 16 * KB, session: true, template: (f) => ({ name: `Token ${MARK}`, workspaceId: f.workspaceId, scope: 'read', expiresInDays: 30 }) },
  // Never a valid body (those are not sent), and its password is not the fixture's either: nothing can delete the account.
  { method: 'DELETE', route: '/api/v1/account', path: () => '/api/v1/account', schema: accountDeleteSchema, limitBytes: 16 * KB, session: true, template: (f) => ({ password: 'not-the-fixture-password', confirm: 'delete my account', workspaces: [{ workspaceId: f.workspaceId, action: 'delete' }] }) },
  { method: 'PATCH', route: '/api/v1/admin/users/[id]', path: (f) => `/api/v1/admin/users/${f.editorId}`, schema: siteRoleUpdateSchema, limitBytes: 16 * KB, session: 'admin', template: () => ({ siteRole: 'member' }) },
  { method: 'POST', route: '/api/v1/workspaces', path: () => '/api/v1/workspaces', schema: workspaceCreateSchema, limitBytes: 16 * KB, session: true, template: () => ({ name: `Workspace ${MARK}` }) },
  { method: 'PATCH', route: '/api/v1/workspaces/[id]', path: (f) => `/api/v1/workspaces/${f.workspaceId}`, schema: workspaceCreateSchema, limitBytes: 16 * KB, session: true, template: () => ({ name: `Workspace ${MARK}` }) },
  { method: 'POST', route: '/api/v1/workspaces/[id]/invitations', path: (f) => `/api/v1/workspaces/${f.workspaceId}/invitations`, schema: invitationCreateSchema, limitBytes: 16 * KB, session: true, template: () => ({ email: `${MARK}-invited@example.test`, role: 'viewer' }) },
  { method: 'PATCH', route: '/api/v1/workspaces/[id]/members/[userId]', path: (f) => `/api/v1/workspaces/${f.workspaceId}/members/${f.editorId}`, schema: memberUpdateSchema, limitBytes: 16 * KB, session: true, template: () => ({ role: 'viewer' }) },
  // Transfer files (issue 19): JSON (or a zip, told by its first bytes), checked whole with the file's schema.
  { method: 'POST', route: '/api/v1/workspaces/import', path: () => '/api/v1/workspaces/import', schema: workspaceFileSchema, limitBytes: 50 * KB * KB, session: true, template: () => smallWorkspaceFile(MARK) },
  { method: 'POST', route: '/api/v1/workspaces/[id]/systems/import', path: (f) => `/api/v1/workspaces/${f.workspaceId}/systems/import`, schema: systemFileSchema, limitBytes: 50 * KB * KB, session: true, template: () => smallSystemFile(MARK) },

  { method: 'POST', route: '/api/v1/systems', path: () => '/api/v1/systems', schema: systemCreateSchema, limitBytes: 256 * KB, session: true, template: (f) => ({ name: `System ${MARK}`, document: juniperLaneDocument(), workspaceId: f.workspaceId }) },
  { method: 'PUT', route: '/api/v1/systems/[id]', path: (f) => `/api/v1/systems/${f.systemId}`, schema: systemUpdateSchema, limitBytes: 256 * KB, session: true, template: (f) => ({ name: `System ${MARK}`, document: juniperLaneDocument(), revision: f.systemRevision }) },
  { method: 'PATCH', route: '/api/v1/systems/[id]', path: (f) => `/api/v1/systems/${f.systemId}`, schema: systemRenameSchema, limitBytes: 16 * KB, session: true, template: (f) => ({ name: `System ${MARK} renamed`, revision: f.systemRevision }) },
  { method: 'POST', route: '/api/v1/systems/[id]/duplicate', path: (f) => `/api/v1/systems/${f.systemId}/duplicate`, schema: systemDuplicateSchema, limitBytes: 16 * KB, session: true, bodyOptional: true, template: (f) => ({ name: `System ${MARK} copy`, workspaceId: f.workspaceId }) },
  { method: 'PATCH', route: '/api/v1/systems/[id]/revisions/[revision]', path: (f) => `/api/v1/systems/${f.systemId}/revisions/1`, schema: revisionNoteUpdateSchema, limitBytes: 16 * KB, session: true, template: () => ({ note: `Note ${MARK}` }) },
  { method: 'POST', route: '/api/v1/systems/[id]/revisions/[revision]/restore', path: (f) => `/api/v1/systems/${f.systemId}/revisions/1/restore`, schema: revisionRestoreSchema, limitBytes: 16 * KB, session: true, template: (f) => ({ revision: f.systemRevision }) },
  { method: 'POST', route: '/api/v1/shared/[token]/copy', path: (f) => `/api/v1/shared/${f.shareToken}/copy`, schema: copySchema, limitBytes: 16 * KB, session: true, template: (f) => ({ workspaceId: f.workspaceId, name: `Copy ${MARK}` }) },
  { method: 'PATCH', route: '/api/v1/measurements/[id]', path: (f) => `/api/v1/measurements/${f.measurementId}`, schema: measurementLabelsSchema, limitBytes: 256 * KB, session: true, template: () => ({ runLabel: `Run ${MARK}`, seat: null }) },

  { method: 'POST', route: '/api/v1/profiles', path: () => '/api/v1/profiles', schema: profileCreateSchema, limitBytes: 32 * KB, session: true, template: (f) => ({ ...profileFields(), workspaceId: f.workspaceId }) },
  { method: 'PUT', route: '/api/v1/profiles/[id]', path: (f) => `/api/v1/profiles/${f.profileId}`, schema: profileUpdateSchema, limitBytes: 32 * KB, session: true, template: () => profileFields() },

  { method: 'POST', route: '/api/v1/lessons', path: () => '/api/v1/lessons', schema: lessonCreateSchema, limitBytes: 16 * KB, session: true, template: (f) => ({ title: `Lesson ${MARK}`, description: 'Invented.', workspaceId: f.workspaceId }) },
  { method: 'PUT', route: '/api/v1/lessons/[id]', path: (f) => `/api/v1/lessons/${f.lessonId}`, schema: lessonUpdateSchema, limitBytes: 16 * KB, session: true, template: (f) => ({ title: `Lesson ${MARK}`, description: 'Invented.', revision: f.lessonRevision }) },
  { method: 'POST', route: '/api/v1/lessons/[id]/steps', path: (f) => `/api/v1/lessons/${f.lessonId}/steps`, schema: stepCreateSchema, limitBytes: 256 * KB, session: true, template: (f) => ({ revision: f.lessonRevision, step: { title: `Step ${MARK}`, points: '- one\n- two', panel: 'blend', traces: ['sum'], document: juniperLaneDocument() } }) },
  { method: 'PUT', route: '/api/v1/lessons/[id]/steps/[stepId]', path: (f) => `/api/v1/lessons/${f.lessonId}/steps/${f.stepIds[0]}`, schema: stepUpdateSchema, limitBytes: 256 * KB, session: true, template: (f) => ({ revision: f.lessonRevision, step: { title: `Step ${MARK}`, points: 'Invented.' } }) },
  { method: 'POST', route: '/api/v1/lessons/[id]/steps/reorder', path: (f) => `/api/v1/lessons/${f.lessonId}/steps/reorder`, schema: stepReorderSchema, limitBytes: 32 * KB, session: true, template: (f) => ({ revision: f.lessonRevision, stepIds: [...f.stepIds].reverse() }) },
];

/** POST/PUT/PATCH/DELETE handlers in app/api that read a JSON body (they call parseJson), found by walking the folder. */
function discoverJsonRoutes(): string[] {
  const found: string[] = [];
  for (const { route, source } of apiRouteFiles()) {
    for (const part of source.split(/(?=export (?:const|async function) (?:GET|POST|PUT|PATCH|DELETE)\b)/)) {
      const m = /^export (?:const|async function) (POST|PUT|PATCH|DELETE)\b/.exec(part);
      if (m && /\bparseJson\(|request\.json\(\)|\breadTransferFile\(/.test(part)) found.push(`${m[1]} ${route}`);
    }
  }
  return found.sort();
}

// ---------------------------------------------------------------- what the server must refuse

const JSON_MEDIA = /^application\/(.+\+)?json\b/i;

/**
 * The route's own rules, applied here first: true when the server must refuse the body
 * (415 other media type, 413 over the limit, 400 not JSON or not matching the schema).
 */
function mustRefuse(r: JsonRoute, body: Outgoing): boolean {
  if (r.bodyOptional && body.bytes.byteLength === 0 && !body.contentType) return false;
  if (!body.contentType || !JSON_MEDIA.test(body.contentType)) return true;
  if (body.bytes.byteLength > r.limitBytes) return true;
  let raw: unknown;
  try {
    raw = JSON.parse(new TextDecoder().decode(body.bytes));
  } catch {
    return true;
  }
  return !r.schema.safeParse(raw).success;
}

// ---------------------------------------------------------------- the generators

const MB = 1024 * 1024;
const MB_STRING = 'x'.repeat(MB);
const MB_WIDE_STRING = 'é∞'.repeat(MB / 4);
const RAW = '@@hostile-raw@@';
/** Tokens placed into the JSON text as they are: JSON.parse turns 1e999 into Infinity and rejects the rest. */
const RAW_TOKENS = [
  '1e999', '-1e999', '1E400', 'NaN', '-NaN', 'Infinity', '-Infinity', '+Infinity', 'undefined', '0x1F', '01', '.5', '+1', '1.', '1e', '--1', "'x'",
  `${'['.repeat(5000)}${']'.repeat(5000)}`,
  `${'{"a":'.repeat(5000)}1${'}'.repeat(5000)}`,
  `${'['.repeat(100_000)}${']'.repeat(100_000)}`,
  `${'['.repeat(5000)}`,
];
const NAN_STRINGS = ['NaN', 'nan', '-NaN', 'Infinity', '-Infinity', '+Infinity', 'infinity', 'INF', 'inf', '-inf', '1e999', '-1e999', '∞', '-∞', '1/0', 'null', 'undefined', '', ' ', '0x10', '1_000', '١٢'];
const HUGE_NUMBERS = [1e308, -1e308, 2 ** 53, -(2 ** 53), 2 ** 53 + 2, Number.MAX_VALUE, -Number.MAX_VALUE, Number.MIN_VALUE, -0, 1e21, 2 ** 31, -(2 ** 31) - 1, 2 ** 64, 0.1 + 0.2];
const POLLUTION_KEYS = ['__proto__', 'constructor', 'prototype'] as const;
const POLLUTION_PAYLOAD = () => ({ polluted: `${MARK}-polluted`, isAdmin: true, role: 'owner', toString: 'x', valueOf: 1 });

const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 4, arbitrary: fc.constantFrom<unknown>(...HUGE_NUMBERS) },
  { weight: 4, arbitrary: fc.constantFrom<unknown>(...NAN_STRINGS) },
  { weight: 3, arbitrary: fc.constant(null) },
  { weight: 2, arbitrary: fc.boolean() },
  { weight: 2, arbitrary: fc.string({ maxLength: 24 }) },
  { weight: 2, arbitrary: fc.integer() },
  { weight: 2, arbitrary: fc.double() },
  { weight: 2, arbitrary: fc.array(fc.oneof(fc.integer(), fc.string({ maxLength: 4 }), fc.constant(null)), { maxLength: 4 }) },
  { weight: 2, arbitrary: fc.dictionary(fc.string({ maxLength: 6 }), fc.oneof(fc.integer(), fc.string({ maxLength: 4 })), { maxKeys: 3 }) },
  { weight: 1, arbitrary: fc.constantFrom<unknown>([], {}, [[]], [{}], '[]', '{}', 'true', '0') },
  { weight: 1, arbitrary: fc.constantFrom<unknown>(MB_STRING, MB_WIDE_STRING) },
  { weight: 1, arbitrary: fc.constant(pollutedObject()) },
);

function pollutedObject(): Record<string, unknown> {
  const o: Record<string, unknown> = {};
  for (const k of POLLUTION_KEYS) Object.defineProperty(o, k, { value: POLLUTION_PAYLOAD(), enumerable: true, writable: true, configurable: true });
  return o;
}

type Op =
  | { kind: 'replace'; at: number; value: unknown }
  | { kind: 'remove'; at: number }
  | { kind: 'raw'; at: number; token: string }
  | { kind: 'root'; value: unknown }
  | { kind: 'root-raw'; token: string }
  | { kind: 'text'; variant: 'empty' | 'truncate' | 'garbage' | 'bom' | 'single-quotes' | 'trailing-comma' | 'concatenated' | 'random'; cut: number; noise: string }
  | { kind: 'media'; contentType: string | null };

interface Mutation {
  op: Op;
  /** Unknown fields added next to the real ones, at the top or in every object. */
  extras: 'none' | 'top' | 'every';
  /** `__proto__`, `constructor` and `prototype` keys: none, at the top, or in every object. */
  pollution: 'none' | 'top' | 'every';
}

const WRONG_MEDIA = [null, 'text/plain', 'text/plain; charset=utf-8', 'application/x-www-form-urlencoded', 'multipart/form-data; boundary=x', 'application/xml', 'text/json', 'application/jsonp', 'application/javascript', 'json', 'application/octet-stream', 'image/png', '*/*', 'application/ json'];

const mutationArb: fc.Arbitrary<Mutation> = fc.record({
  op: fc.oneof(
    { weight: 36, arbitrary: fc.record({ kind: fc.constant('replace' as const), at: fc.nat(), value: hostileValue }) },
    { weight: 10, arbitrary: fc.record({ kind: fc.constant('remove' as const), at: fc.nat() }) },
    { weight: 16, arbitrary: fc.record({ kind: fc.constant('raw' as const), at: fc.nat(), token: fc.constantFrom(...RAW_TOKENS) }) },
    { weight: 5, arbitrary: fc.record({ kind: fc.constant('root' as const), value: fc.oneof(hostileValue, fc.array(fc.anything(), { maxLength: 3 })) }) },
    { weight: 5, arbitrary: fc.record({ kind: fc.constant('root-raw' as const), token: fc.constantFrom(...RAW_TOKENS) }) },
    {
      weight: 14,
      arbitrary: fc.record({
        kind: fc.constant('text' as const),
        variant: fc.constantFrom('empty', 'truncate', 'garbage', 'bom', 'single-quotes', 'trailing-comma', 'concatenated', 'random'),
        cut: fc.nat(),
        noise: fc.string({ maxLength: 40, unit: 'binary' }),
      }),
    },
    { weight: 8, arbitrary: fc.record({ kind: fc.constant('media' as const), contentType: fc.constantFrom(...WRONG_MEDIA) }) },
  ) as fc.Arbitrary<Op>,
  extras: fc.constantFrom('none', 'none', 'top', 'every'),
  pollution: fc.constantFrom('none', 'top', 'every', 'every'),
});

type Path = (string | number)[];

/** Every place in a body (object keys and array items), the body itself excluded. */
function pathsOf(value: unknown, prefix: Path = [], out: Path[] = []): Path[] {
  const entries: [string | number, unknown][] = Array.isArray(value) ? value.map((v, i) => [i, v]) : value && typeof value === 'object' ? Object.entries(value) : [];
  for (const [k, v] of entries) {
    out.push([...prefix, k]);
    pathsOf(v, [...prefix, k], out);
  }
  return out;
}

function parentOf(body: unknown, p: Path): { parent: Record<string | number, unknown> | unknown[]; key: string | number } | null {
  let node = body;
  for (const k of p.slice(0, -1)) {
    if (!node || typeof node !== 'object') return null;
    node = (node as Record<string | number, unknown>)[k];
  }
  if (!node || typeof node !== 'object') return null;
  return { parent: node as Record<string | number, unknown>, key: p[p.length - 1]! };
}

function eachObject(value: unknown, visit: (o: Record<string, unknown>) => void) {
  if (Array.isArray(value)) value.forEach((v) => eachObject(v, visit));
  else if (value && typeof value === 'object') {
    for (const v of Object.values(value)) eachObject(v, visit);
    visit(value as Record<string, unknown>);
  }
}

function decorate(body: unknown, m: Mutation) {
  const add = (o: Record<string, unknown>, pollution: boolean, extras: boolean) => {
    if (pollution) for (const k of POLLUTION_KEYS) Object.defineProperty(o, k, { value: POLLUTION_PAYLOAD(), enumerable: true, writable: true, configurable: true });
    if (extras) Object.assign(o, { [`${MARK}Extra`]: 1, unknownField: 'x', isAdmin: true, role: 'owner', deletedAt: null, id: '00000000-0000-4000-8000-000000000000' });
  };
  if (m.pollution === 'every' || m.extras === 'every') eachObject(body, (o) => add(o, m.pollution === 'every', m.extras === 'every'));
  if (body && typeof body === 'object' && !Array.isArray(body)) add(body as Record<string, unknown>, m.pollution === 'top', m.extras === 'top');
}

interface Outgoing {
  bytes: Uint8Array;
  contentType: string | null;
  label: string;
}

const encoder = new TextEncoder();

function materialize(template: unknown, paths: Path[], m: Mutation): Outgoing {
  const body = structuredClone(template);
  decorate(body, m);
  const json = (contentType: string | null, text: string, label: string): Outgoing => ({ bytes: encoder.encode(text), contentType, label });
  const ct = 'application/json';
  const op = m.op;
  const tag = `${op.kind}${m.extras !== 'none' ? `+extras:${m.extras}` : ''}${m.pollution !== 'none' ? `+pollution:${m.pollution}` : ''}`;
  const at = (n: number) => paths[n % Math.max(1, paths.length)] ?? [];
  switch (op.kind) {
    case 'replace': {
      const p = at(op.at);
      const slot = parentOf(body, p);
      if (slot) (slot.parent as Record<string | number, unknown>)[slot.key] = op.value;
      return json(ct, JSON.stringify(body), `${tag} ${p.join('.')}`);
    }
    case 'remove': {
      const p = at(op.at);
      const slot = parentOf(body, p);
      if (slot && Array.isArray(slot.parent)) slot.parent.splice(Number(slot.key), 1);
      else if (slot) delete (slot.parent as Record<string | number, unknown>)[slot.key];
      return json(ct, JSON.stringify(body), `${tag} ${p.join('.')}`);
    }
    case 'raw': {
      const p = at(op.at);
      const slot = parentOf(body, p);
      if (slot) (slot.parent as Record<string | number, unknown>)[slot.key] = RAW;
      return json(ct, JSON.stringify(body).replace(`"${RAW}"`, op.token), `${tag} ${p.join('.')} = ${op.token.slice(0, 12)}`);
    }
    case 'root':
      return json(ct, JSON.stringify(op.value) ?? 'undefined', tag);
    case 'root-raw':
      return json(ct, op.token, `${tag} ${op.token.slice(0, 12)}`);
    case 'text': {
      const text = JSON.stringify(body);
      const variants: Record<typeof op.variant, () => string> = {
        empty: () => '',
        truncate: () => text.slice(0, op.cut % Math.max(1, text.length - 1)),
        garbage: () => `${text}${op.noise || 'x'}`,
        bom: () => `\uFEFF${text}`,
        'single-quotes': () => text.replaceAll('"', "'"),
        'trailing-comma': () => text.replace(/}$/, ',}'),
        concatenated: () => `${text}${text}`,
        random: () => op.noise,
      };
      return json(ct, variants[op.variant](), `${tag}:${op.variant}`);
    }
    case 'media':
      return json(op.contentType, JSON.stringify(body), `${tag} ${String(op.contentType)}`);
  }
}

const hash = (s: string) => [...s].reduce((h, c) => (h * 31 + c.charCodeAt(0)) | 0, 0) & 0xffff;

/** Yields bodies the route must refuse until `count`, counting those its rules would accept (not sent). */
function* refusedBodies(r: JsonRoute, f: Fixture, count: number, stats: { generated: number; acceptable: number }): Generator<Outgoing> {
  const template = r.template(f);
  const paths = pathsOf(template);
  let sent = 0;
  for (let batch = 0; sent < count && batch < 200; batch++) {
    for (const m of fc.sample(mutationArb, { numRuns: 100, seed: SEED + batch * 7919 + hash(`${r.method} ${r.route}`) })) {
      if (sent >= count) return;
      const body = materialize(template, paths, m);
      stats.generated++;
      if (!mustRefuse(r, body)) {
        stats.acceptable++;
        continue;
      }
      sent++;
      yield body;
    }
  }
}

// ---------------------------------------------------------------- sending

interface Answer {
  status: number;
  text: string;
}

async function send(method: string, urlPath: string, body: Uint8Array | FormData | undefined, contentType: string | null, cookie: string | null): Promise<Answer> {
  const headers: Record<string, string> = {};
  if (contentType) headers['Content-Type'] = contentType;
  if (cookie) headers.Cookie = cookie;
  const res = await fetch(`${baseUrl()}${urlPath}`, { method, headers, body: body as BodyInit, redirect: 'manual' });
  return { status: res.status, text: await res.text() };
}

const REFUSALS = new Set([400, 413, 415]);
const LEAK = /\bat \S+ \(|node_modules|\.tsx?:\d+|SELECT |INSERT INTO|UPDATE "|DELETE FROM|Sequelize|SQLSTATE|TypeError|ReferenceError/;

/** Why an answer is wrong, or null when it is a proper refusal. */
function fault(a: Answer): string | null {
  if (!REFUSALS.has(a.status)) return `status ${a.status}`;
  let parsed: { error?: { code?: unknown; message?: unknown } } | null = null;
  try {
    parsed = JSON.parse(a.text);
  } catch {
    return `status ${a.status} without a JSON error body`;
  }
  if (typeof parsed?.error?.message !== 'string' || typeof parsed.error.code !== 'string') return `status ${a.status} without error.code/message`;
  if (LEAK.test(a.text)) return `status ${a.status} leaks internals: ${a.text.slice(0, 200)}`;
  if (a.text.includes(`${MARK}-polluted`)) return 'the answer echoes a prototype-pollution payload';
  return null;
}

/** Sends every item through `IN_FLIGHT` keep-alive connections; returns the faults found (first 10 kept). */
async function barrage<T>(items: Iterator<T>, call: (item: T) => Promise<Answer>, describeItem: (item: T) => string) {
  const statuses: Record<number, number> = {};
  const faults: string[] = [];
  let faultCount = 0;
  let sent = 0;
  let resets = 0;
  const worker = async () => {
    for (let next = items.next(); !next.done; next = items.next()) {
      const item = next.value;
      sent++;
      let answer: Answer;
      try {
        answer = await call(item);
      } catch {
        // A connection reset (the server may close a keep-alive connection after refusing a large
        // body early) is sent once more on a new connection; a second failure is a fault.
        resets++;
        // Never silent: npm test counts every resend in its summary line.
        if (process.env.SEAMLINE_RETRY_LOG) appendFileSync(process.env.SEAMLINE_RETRY_LOG, `hostile-input resent ${describeItem(item)} after a connection reset\n`);
        try {
          answer = await call(item);
        } catch (e) {
          answer = { status: -1, text: String((e as Error).cause ?? e) };
        }
      }
      statuses[answer.status] = (statuses[answer.status] ?? 0) + 1;
      const why = fault(answer);
      if (why) {
        faultCount++;
        if (faults.length < 10) faults.push(`${why} for ${describeItem(item)}: ${answer.text.slice(0, 160)}`);
      }
    }
  };
  await Promise.all(Array.from({ length: IN_FLIGHT }, worker));
  return { statuses, faults, faultCount, sent, resets };
}

// ---------------------------------------------------------------- the database before and after

async function snapshot(): Promise<Map<string, TableState>> {
  return tableStates(await testDb(), UNWATCHED);
}

/** Rows added or gone per table, between two snapshots. */
function differences(before: Map<string, TableState>, after: Map<string, TableState>) {
  const out: { table: string; added: string[]; removed: string[] }[] = [];
  for (const table of new Set([...before.keys(), ...after.keys()])) {
    const b = before.get(table);
    const a = after.get(table);
    if (b && a && b.count === a.count && b.checksum === a.checksum) continue;
    const bs = new Set(b?.rows ?? []);
    const as = new Set(a?.rows ?? []);
    out.push({ table, added: [...as].filter((r) => !bs.has(r)), removed: [...bs].filter((r) => !as.has(r)) });
  }
  return out;
}

// ---------------------------------------------------------------- uploads

const PNG_BYTES = Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52, 0, 0, 0, 1, 0, 0, 0, 1, 8, 6, 0, 0, 0, 0x1f, 0x15, 0xc4, 0x89, 0, 0, 0, 10, 0x49, 0x44, 0x41, 0x54, 0x78, 0x9c, 0x63, 0, 1, 0, 0, 5, 0, 1, 0x0d, 0x0a, 0x2d, 0xb4, 0, 0, 0, 0, 0x49, 0x45, 0x4e, 0x44, 0xae, 0x42, 0x60, 0x82]);
const GOOD_CURVE = ['# invented test curve', 'Frequency (Hz),Magnitude (dB)', ...Array.from({ length: 24 }, (_, i) => `${(20 * 1.25 ** i).toFixed(3)},${(-i * 0.4).toFixed(2)}`)].join('\n');

type Upload =
  | { kind: 'form'; label: string; file: { bytes: Uint8Array; name: string; type: string } | null; fields: Record<string, string>; fileAsText?: boolean; twoFiles?: boolean }
  | { kind: 'raw'; label: string; bytes: Uint8Array; contentType: string | null };

const uploadArb = (workspaceId: string): fc.Arbitrary<Upload> => {
  const fields = fc.oneof(
    { weight: 4, arbitrary: fc.constant({ workspaceId }) },
    { weight: 1, arbitrary: fc.constant({ workspaceId, name: '' }) },
    { weight: 1, arbitrary: fc.constant({ workspaceId, role: '<script>' }) },
    { weight: 1, arbitrary: fc.constant({ workspaceId, __proto__x: '1', constructor: 'x' }) },
    { weight: 1, arbitrary: fc.constant({ workspaceId: 'not-a-uuid' }) },
    { weight: 1, arbitrary: fc.constant({ workspaceId, seat: 'x'.repeat(61) }) },
  );
  const text = (s: string) => encoder.encode(s);
  const file = fc.oneof(
    { weight: 3, arbitrary: fc.record({ label: fc.constant('truncated file'), bytes: fc.nat({ max: GOOD_CURVE.length }).map((n) => text(GOOD_CURVE.slice(0, Math.min(n, 120)))), name: fc.constant('curve.txt'), type: fc.constant('text/plain') }) },
    { weight: 3, arbitrary: fc.record({ label: fc.constant('binary file'), bytes: fc.uint8Array({ minLength: 1, maxLength: 4096 }), name: fc.constantFrom('curve.txt', 'curve.csv', 'curve.bin'), type: fc.constantFrom('text/plain', 'text/csv', '') }) },
    { weight: 2, arbitrary: fc.record({ label: fc.constant('image named .txt'), bytes: fc.constant(PNG_BYTES), name: fc.constant('curve.txt'), type: fc.constantFrom('text/plain', 'text/csv') }) },
    { weight: 2, arbitrary: fc.record({ label: fc.constant('text sent as image/png'), bytes: fc.constant(text(GOOD_CURVE)), name: fc.constantFrom('curve.png', 'curve.txt'), type: fc.constantFrom('image/png', 'application/pdf', 'application/zip', 'audio/wav') }) },
    { weight: 2, arbitrary: fc.record({ label: fc.constant('hostile numbers'), bytes: fc.constantFrom('NaN,1', 'Infinity,-Infinity', '1e999,1e999', '1e308,1e308', '-1,0', '0,0').map((line) => text([GOOD_CURVE, ...Array(10).fill(line)].join('\n'))), name: fc.constant('curve.csv'), type: fc.constant('text/csv') }) },
    { weight: 1, arbitrary: fc.record({ label: fc.constant('oversized file'), bytes: fc.constant(text(`${GOOD_CURVE}\n${'#'.repeat(MAX_MEASUREMENT_BYTES)}`)), name: fc.constant('curve.txt'), type: fc.constant('text/plain') }) },
  );
  return fc.oneof(
    { weight: 10, arbitrary: fc.record({ kind: fc.constant('form' as const), label: fc.constant('form'), file, fields }).map((u) => ({ ...u, label: u.file.label, file: { bytes: u.file.bytes, name: u.file.name, type: u.file.type } })) },
    { weight: 1, arbitrary: fc.constant<Upload>({ kind: 'form', label: 'no file', file: null, fields: { workspaceId } }) },
    { weight: 1, arbitrary: fc.constant<Upload>({ kind: 'form', label: 'file as a text field', file: null, fields: { workspaceId }, fileAsText: true }) },
    { weight: 1, arbitrary: fc.constant<Upload>({ kind: 'form', label: 'two files', file: { bytes: text(GOOD_CURVE), name: 'a.txt', type: 'text/plain' }, fields: { workspaceId }, twoFiles: true }) },
    { weight: 1, arbitrary: fc.constant<Upload>({ kind: 'form', label: 'unknown field', file: { bytes: text(GOOD_CURVE), name: 'a.txt', type: 'text/plain' }, fields: { workspaceId, admin: '1' } }) },
    {
      weight: 3,
      arbitrary: fc.record({
        kind: fc.constant('raw' as const),
        label: fc.constantFrom('truncated multipart', 'multipart without boundary', 'JSON instead of multipart', 'no content type', 'garbage multipart'),
        bytes: fc.constant(new Uint8Array()),
        contentType: fc.constant<string | null>(null),
      }).map((u): Upload => {
        const boundary = 'hostileBoundary42';
        const full = `--${boundary}\r\nContent-Disposition: form-data; name="workspaceId"\r\n\r\n${workspaceId}\r\n--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="c.txt"\r\nContent-Type: text/plain\r\n\r\n${GOOD_CURVE}\r\n--${boundary}--\r\n`;
        switch (u.label) {
          case 'truncated multipart':
            return { ...u, bytes: text(full.slice(0, full.length - 60)), contentType: `multipart/form-data; boundary=${boundary}` };
          case 'multipart without boundary':
            return { ...u, bytes: text(full), contentType: 'multipart/form-data' };
          case 'JSON instead of multipart':
            return { ...u, bytes: text(JSON.stringify({ workspaceId, file: GOOD_CURVE })), contentType: 'application/json' };
          case 'no content type':
            return { ...u, bytes: text(full), contentType: null };
          default:
            return { ...u, bytes: text(`--${boundary}\r\n\u0000\u0001garbage`), contentType: `multipart/form-data; boundary=${boundary}` };
        }
      }),
    },
  );
};

/** The upload rules, applied here first: true when the server must refuse it. */
function uploadMustBeRefused(u: Upload): boolean {
  if (u.kind === 'raw') return true;
  if (!u.file || u.fileAsText || u.twoFiles) return true;
  if (!measurementUploadFieldsSchema.safeParse(u.fields).success) return true;
  if (u.file.bytes.byteLength > MAX_MEASUREMENT_BYTES) return true;
  if (!isTextMediaType(u.file.type || 'application/octet-stream')) return true;
  return !parseMeasurementBytes(u.file.bytes).ok;
}

function uploadBody(u: Upload): { body: Uint8Array | FormData; contentType: string | null } {
  if (u.kind === 'raw') return { body: u.bytes, contentType: u.contentType };
  const form = new FormData();
  for (const [k, v] of Object.entries(u.fields)) form.append(k, v);
  if (u.fileAsText) form.append('file', GOOD_CURVE);
  if (u.file) form.append('file', new Blob([u.file.bytes as BlobPart], { type: u.file.type }), u.file.name);
  if (u.twoFiles && u.file) form.append('file', new Blob([u.file.bytes as BlobPart], { type: u.file.type }), `second-${u.file.name}`);
  return { body: form, contentType: null };
}

// ---------------------------------------------------------------- the fixture

const cookieFor = (r: JsonRoute, f: Fixture): string | null => (r.session === 'admin' ? f.adminCookie : r.session ? f.cookie : null);

async function signUp(prefix: string): Promise<{ id: string; email: string }> {
  const email = uniqueEmail(`${MARK}-${prefix}`);
  const res = await new Client().post('/api/v1/auth/sign-up', { name: `Hostile ${prefix}`, email, password: 'a-long-password-1' });
  if (res.status !== 201) throw new Error(`fixture: sign-up ${res.status} ${res.text}`);
  return { id: res.body.id, email };
}

describe('hostile input on every JSON route and on uploads', () => {
  const f = {} as Fixture;
  let before: Map<string, TableState>;
  let windowStart = 0;
  const figures: string[] = [];
  const started = Date.now();

  beforeAll(async () => {
    await testDb();
    const owner = await signUp('owner');
    const editor = await signUp('editor');
    f.cookie = await sessionCookie(owner.email, 'a-long-password-1');
    const admin = await signUp('admin');
    await (await testDb()).query("UPDATE users SET site_role = 'admin' WHERE id = :id", { replacements: { id: admin.id } });
    f.adminCookie = await sessionCookie(admin.email, 'a-long-password-1');
    const client = new Client();
    await client.signIn(owner.email, 'a-long-password-1');
    const ws = await client.post('/api/v1/workspaces', { name: `Hostile workspace ${MARK}` });
    f.workspaceId = ws.body.id;
    await addMember(f.workspaceId, editor.id, 'editor');
    f.editorId = editor.id;
    const sys = await client.post('/api/v1/systems', { name: `Hostile system ${MARK}`, document: juniperLaneDocument(), workspaceId: f.workspaceId });
    f.systemId = sys.body.id;
    f.systemRevision = sys.body.revision;
    const lesson = await client.post('/api/v1/lessons', { title: `Hostile lesson ${MARK}`, workspaceId: f.workspaceId });
    f.lessonId = lesson.body.id;
    await client.post(`/api/v1/lessons/${f.lessonId}/steps`, { step: { title: 'One', panel: 'blend', document: juniperLaneDocument() } });
    const two = await client.post(`/api/v1/lessons/${f.lessonId}/steps`, { step: { title: 'Two', panel: 'timing', document: juniperLaneDocument() } });
    f.lessonRevision = two.body.revision;
    f.stepIds = two.body.steps.map((s: { id: string }) => s.id);
    f.profileId = (await client.post('/api/v1/profiles', { ...profileFields(), workspaceId: f.workspaceId })).body.id;
    f.shareToken = (await client.post(`/api/v1/systems/${f.systemId}/share-links`)).body.token;
    const curve = new FormData();
    curve.set('file', new Blob([GOOD_CURVE], { type: 'text/csv' }), 'curve.csv');
    curve.set('workspaceId', f.workspaceId);
    f.measurementId = (await client.post('/api/v1/measurements', curve)).body.id;
    f.ids = [owner.id, editor.id, admin.id, f.workspaceId, f.systemId, f.lessonId, ...f.stepIds, f.profileId, f.shareToken, f.measurementId, MARK];
    for (const [k, v] of Object.entries(f)) if (v === undefined || v === null) throw new Error(`fixture ${k} missing`);
    // Every template is valid and answered 2xx? Not sent: the templates are only checked against the
    // route's own rules here, so a broken template fails loudly instead of making every mutation trivially invalid.
    for (const r of JSON_ROUTES) {
      const t = r.template(f);
      const parsed = r.schema.safeParse(t);
      if (!parsed.success) throw new Error(`template for ${r.method} ${r.route} is not valid: ${parsed.error.message}`);
    }
    // Warm up (dev servers compile a route on its first call).
    for (const r of JSON_ROUTES) await send(r.method, r.path(f), encoder.encode('{'), 'application/json', cookieFor(r, f));
    await send('POST', '/api/v1/measurements', encoder.encode('x'), 'text/plain', f.cookie);
    before = await snapshot();
    windowStart = Date.now();
  }, 240_000);

  afterAll(() => {
    console.log(`hostile input: ${figures.length} groups in ${((Date.now() - started) / 1000).toFixed(1)} s (seed ${SEED}, ${IN_FLIGHT} in flight)\n${figures.join('\n')}`);
  });

  it('has an entry for every JSON route in app/api, and none for a route that does not exist', () => {
    const listed = JSON_ROUTES.map((r) => `${r.method} ${r.route}`).sort();
    const found = discoverJsonRoutes();
    expect(found.filter((r) => !listed.includes(r)), 'JSON routes without an entry here').toEqual([]);
    expect(listed.filter((r) => !found.includes(r)), 'entries for routes that do not read JSON').toEqual([]);
  });

  for (const r of JSON_ROUTES) {
    it(`${r.method} ${r.route}: ${BODIES_PER_ROUTE} malformed bodies are all answered 400/413/415`, async () => {
      const stats = { generated: 0, acceptable: 0 };
      const t0 = Date.now();
      const result = await barrage(
        refusedBodies(r, f, BODIES_PER_ROUTE, stats),
        (b) => send(r.method, r.path(f), b.bytes, b.contentType, cookieFor(r, f)),
        (b) => `${b.label} (${b.bytes.byteLength} bytes, ${b.contentType ?? 'no content type'}): ${new TextDecoder().decode(b.bytes.slice(0, 120))}`,
      );
      const s = (Date.now() - t0) / 1000;
      figures.push(`  ${`${r.method} ${r.route}`.padEnd(58)} sent ${result.sent}, ${JSON.stringify(result.statuses)}, ${stats.acceptable} generated bodies were valid (not sent), ${result.resets} connection resets resent, ${s.toFixed(1)} s (${Math.round(result.sent / s)}/s)`);
      expect(result.faults, `${result.faultCount} wrong answers`).toEqual([]);
      expect(result.sent).toBe(BODIES_PER_ROUTE);
    }, 600_000);
  }

  it(`POST /api/v1/measurements: ${UPLOADS} truncated, binary, mislabelled and oversized uploads are all answered 400/413/415`, async () => {
    const text = (t: string) => encoder.encode(t);
    const form = (label: string, bytes: Uint8Array, name: string, type: string): Upload => ({ kind: 'form', label, file: { bytes, name, type }, fields: { workspaceId: f.workspaceId } });
    // One of each kind for certain, then fast-check's mix.
    const certain: Upload[] = [
      form('truncated file', text(GOOD_CURVE.slice(0, 70)), 'curve.txt', 'text/plain'),
      form('binary file', Uint8Array.from({ length: 2048 }, (_, i) => (i * 7919) % 256), 'curve.txt', 'text/plain'),
      form('image named .txt', PNG_BYTES, 'curve.txt', 'text/plain'),
      form('text sent as image/png', text(GOOD_CURVE), 'curve.png', 'image/png'),
      form('oversized file', text(`${GOOD_CURVE}\n${'#'.repeat(MAX_MEASUREMENT_BYTES)}`), 'curve.txt', 'text/plain'),
    ];
    const uploads = [...certain, ...fc.sample(uploadArb(f.workspaceId), { numRuns: UPLOADS * 2, seed: SEED })].filter(uploadMustBeRefused).slice(0, UPLOADS);
    const kinds = new Set(uploads.map((u) => u.label));
    for (const k of ['truncated file', 'binary file', 'image named .txt', 'text sent as image/png', 'oversized file', 'hostile numbers', 'truncated multipart', 'multipart without boundary']) expect([...kinds], `the uploads include "${k}"`).toContain(k);
    const t0 = Date.now();
    const result = await barrage(
      uploads[Symbol.iterator](),
      (u) => {
        const { body, contentType } = uploadBody(u);
        return send('POST', '/api/v1/measurements', body, contentType, f.cookie);
      },
      (u) => u.label,
    );
    figures.push(`  ${'POST /api/v1/measurements (multipart)'.padEnd(58)} sent ${result.sent}, ${JSON.stringify(result.statuses)}, ${result.resets} connection resets resent, ${((Date.now() - t0) / 1000).toFixed(1)} s`);
    expect(result.faults, `${result.faultCount} wrong answers`).toEqual([]);
    expect(result.sent).toBe(uploads.length);
    const oversized = uploads.find((u) => u.label === 'oversized file')!;
    const { body } = uploadBody(oversized);
    expect((await send('POST', '/api/v1/measurements', body, null, f.cookie)).status).toBe(413);
  }, 300_000);

  it('the server still answers a valid request properly, and nothing polluted its objects', async () => {
    const blend = JSON_ROUTES.find((r) => r.route === '/api/v1/blend')!;
    const ok = await send('POST', '/api/v1/blend', encoder.encode(JSON.stringify(blend.template(f))), 'application/json', null);
    expect(ok.status).toBe(200);
    const list = await send('GET', `/api/v1/systems?workspaceId=${f.workspaceId}`, undefined, null, f.cookie);
    expect(list.status).toBe(200);
    expect(list.text).not.toContain(`${MARK}-polluted`);
    expect(JSON.parse(list.text).items.map((s: { id: string }) => s.id)).toEqual([f.systemId]);
  });

  it('the database holds exactly what it held before (every table but rate_limits, dev_messages, umzug_meta)', async () => {
    let diff = differences(before, await snapshot());
    if (diff.length && !PRIVATE_DB) {
      // The dev database is shared: others' writes in the window are told apart from ours by
      // looking for the fixture's ids and this run's mark in every changed row.
      const ours = (row: string) => f.ids.some((id) => row.includes(id));
      const foreign = diff.map((d) => ({ table: d.table, added: d.added.filter((r) => !ours(r)).length, removed: d.removed.filter((r) => !ours(r)).length }));
      console.warn(`shared database: rows changed by others during the run (${Math.round((Date.now() - windowStart) / 1000)} s window), not counted: ${JSON.stringify(foreign)}`);
      diff = diff.map((d) => ({ ...d, added: d.added.filter(ours), removed: d.removed.filter(ours) })).filter((d) => d.added.length || d.removed.length);
    }
    expect(diff.map((d) => ({ table: d.table, added: d.added.slice(0, 3), removed: d.removed.slice(0, 3) }))).toEqual([]);
  }, 60_000);
});
