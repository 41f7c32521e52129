import { strToU8, zipSync } from 'fflate';
import { beforeAll, describe, expect, it } from 'vitest';
import { lindenStreetDocument } from '@/lib/demo/systems';
import { baseUrl } from '../helpers/env';
import { Client, sessionCookie, signedInClient, uniqueEmail } from '../helpers/http';
import { rowCounts, smallSystemFile, smallWorkspaceFile, systemPart } from '../helpers/transfer';

/**
 * Hostile import files (issue 19): a wrong version, 10 000-deep nesting, 1 000 Systems of which part 900 fails the
 * schema, 50 MB, names with markup, a zip bomb, a zip with a missing entry, a truncated zip, another media type. Each
 * is refused with the part and field named (or 413/415) and creates nothing — the importer's rows and every row
 * carrying this run's mark are counted before and after — and the server answers normally afterwards.
 */

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- answers are read as plain JSON
type Json = any;
const PASSWORD = 'a-long-password-1';
const MARK = `hostilexfer${Date.now().toString(36)}`;

let client: Client;
let userId = '';
let email = '';
let cookie = '';

/** POSTs raw bytes to an import route as the test user. */
async function sendBytes(path: string, body: Uint8Array | string, contentType: string | null): Promise<{ status: number; body: Json }> {
  const res = await fetch(`${baseUrl()}${path}`, { method: 'POST', headers: { Cookie: cookie, ...(contentType ? { 'Content-Type': contentType } : {}) }, body: body as BodyInit });
  const text = await res.text();
  let parsed: unknown = null;
  try {
    parsed = JSON.parse(text);
  } catch {
    parsed = null;
  }
  return { status: res.status, body: parsed };
}

/** The refusal must come with nothing created, and the server must answer a valid request at once afterwards. */
async function expectRefused(send: () => Promise<{ status: number; body: Json }>, status: number): Promise<Json> {
  const before = await rowCounts(userId, MARK);
  const res = await send();
  expect(res.status, JSON.stringify(res.body)?.slice(0, 400)).toBe(status);
  expect(res.body?.error?.message).toBeTypeOf('string');
  expect(await rowCounts(userId, MARK)).toEqual(before);
  expect((await client.get('/api/v1/workspaces')).status).toBe(200);
  return res.body;
}

beforeAll(async () => {
  email = uniqueEmail(MARK);
  const res = await new Client().post('/api/v1/auth/sign-up', { name: 'Hostile transfer (invented)', email, password: PASSWORD });
  if (res.status !== 201) throw new Error(`sign-up ${res.status}`);
  userId = res.body.id;
  client = await signedInClient(email, PASSWORD);
  cookie = await sessionCookie(email, PASSWORD);
}, 60_000);

describe('hostile import files are refused whole', () => {
  it('a file of another version: 400 naming version, nothing created', async () => {
    const body = await expectRefused(() => client.post('/api/v1/workspaces/import', { ...smallWorkspaceFile(MARK), version: 2 }), 400);
    expect(body.error.issues).toEqual([{ path: 'version', message: 'must be 1: this Seamline reads version 1 files (the file says 2)' }]);
  });

  it('a System file sent as a workspace file (and the other way round): 400 naming format, with where it goes', async () => {
    const a = await expectRefused(() => client.post('/api/v1/workspaces/import', smallSystemFile(MARK)), 400);
    expect(a.error.issues[0].path).toBe('format');
    expect(a.error.message).toMatch(/This is a System file/);
    const personal = (await client.get('/api/v1/workspaces')).body.items[0].id;
    const b = await expectRefused(() => client.post(`/api/v1/workspaces/${personal}/systems/import`, smallWorkspaceFile(MARK)), 400);
    expect(b.error.message).toMatch(/whole-workspace file/);
  });

  it('10 000-deep nesting inside a document and beside the parts: 400 naming the field, no stack overflow, the server unhurt', async () => {
    const file = smallWorkspaceFile(MARK);
    const text = JSON.stringify(file);
    file.systems[0]!.revisions[0]!.document = { ...lindenStreetDocument(), notes: '@@deep@@' };
    const deepArray = `${'['.repeat(10_000)}${']'.repeat(10_000)}`;
    const inNotes = JSON.stringify(file).replace('"@@deep@@"', deepArray);
    expect(inNotes).toContain(deepArray);
    const a = await expectRefused(() => sendBytes('/api/v1/workspaces/import', inNotes, 'application/json'), 400);
    expect(a.error.issues[0].path).toBe('systems.0.revisions.0.document.notes');
    const deepObject = `${'{"a":'.repeat(10_000)}1${'}'.repeat(10_000)}`;
    const beside = `${text.slice(0, -1)},"extra":${deepObject}}`;
    const b = await expectRefused(() => sendBytes('/api/v1/workspaces/import', beside, 'application/json'), 400);
    expect(b.error.issues[0].message).toMatch(/extra/);
    // Still working: a valid file is imported.
    expect((await client.post('/api/v1/workspaces/import', smallWorkspaceFile(`${MARK}ok`))).status).toBe(201);
  });

  it('1 000 Systems whose part 900 fails the schema: 400 naming systems.900…, and not one of the other 999 created', async () => {
    const file = smallWorkspaceFile(MARK);
    file.systems = Array.from({ length: 1000 }, (_, i) => systemPart(`${MARK} ${i}`, i === 0 ? 'system-1' : `system-${i + 1000}`));
    const broken = lindenStreetDocument();
    broken.room.lengthM = 1;
    file.systems[900] = systemPart(`${MARK} 900`, 'system-1900', broken);
    const body = await expectRefused(() => client.post('/api/v1/workspaces/import', file), 400);
    expect(body.error.issues[0]).toEqual({ path: 'systems.900.revisions.0.document.room.lengthM', message: 'lengthM must be at least 1.5' });
    // Every issue is in part 900 (its two revisions hold the short room): the other 999 passed.
    expect(body.error.issues.map((i: Json) => i.path.split('.').slice(0, 2).join('.'))).toEqual(body.error.issues.map(() => 'systems.900'));
    expect(body.error.totalIssues).toBe(body.error.issues.length);
    expect(body.error.message).toMatch(/^The file was refused and nothing was changed: systems\.900\.revisions\.0\.document\.room\.lengthM/);
  }, 60_000);

  it('a file over 50 MB: 413 before it is parsed', async () => {
    const huge = `{"format":"seamline-workspace","pad":"${'x'.repeat(50 * 1024 * 1024)}"}`;
    const body = await expectRefused(() => sendBytes('/api/v1/workspaces/import', huge, 'application/json'), 413);
    expect(body.error.code).toBe('too_large');
  }, 60_000);

  it('names with markup are stored as plain text and never rendered as HTML', async () => {
    const file = smallWorkspaceFile(MARK);
    const markup = `<script>alert("${MARK}")</script> den`;
    file.systems[0]!.name = markup;
    file.lessons[0]!.title = `<img src=x onerror=alert(1)> ${MARK}`;
    const answer = (await client.post('/api/v1/workspaces/import', file)).body;
    expect(answer.systems[0].name).toBe(markup);
    const read = await client.get(`/api/v1/systems/${answer.systems[0].id}`);
    expect(read.body.name).toBe(markup);
    const page = await fetch(`${baseUrl()}/library/${answer.systems[0].id}`, { headers: { Cookie: cookie } });
    const html = await page.text();
    expect(page.status).toBe(200);
    expect(html).not.toContain(`<script>alert("${MARK}")`);
    expect(html).toContain(`&lt;script&gt;alert(`);
  });

  it('a zip bomb (an entry that unpacks past 128 MB) is refused without unpacking it whole', async () => {
    const file = smallWorkspaceFile(MARK);
    const { points: _points, ...m } = file.measurements[0]!;
    void _points;
    const main = { ...file, measurements: [{ ...m, pointsFile: 'measurements/measurement-1.json' }] };
    const bomb = zipSync({ 'workspace.json': strToU8(JSON.stringify(main)), 'measurements/measurement-1.json': new Uint8Array(160 * 1024 * 1024) }, { level: 9 });
    expect(bomb.byteLength).toBeLessThan(1024 * 1024);
    const body = await expectRefused(() => sendBytes('/api/v1/workspaces/import', bomb, 'application/zip'), 400);
    expect(body.error.message).toMatch(/zip bomb/);
  }, 60_000);

  it('a zip of more than 20 001 entries is refused', async () => {
    const entries: Record<string, Uint8Array> = { 'workspace.json': strToU8(JSON.stringify(smallWorkspaceFile(MARK))) };
    for (let i = 0; i < 20_002; i++) entries[`junk/${i}.txt`] = new Uint8Array(0);
    const body = await expectRefused(() => sendBytes('/api/v1/workspaces/import', zipSync(entries), 'application/zip'), 400);
    expect(body.error.message).toMatch(/more than 20001 entries/);
  }, 60_000);

  it('a zip whose measurement entry is missing: 400 naming measurements.0.pointsFile; a truncated zip: 400', async () => {
    const file = smallWorkspaceFile(MARK);
    const { points, ...m } = file.measurements[0]!;
    const main = strToU8(JSON.stringify({ ...file, measurements: [{ ...m, pointsFile: 'measurements/measurement-1.json' }] }));
    const missing = await expectRefused(() => sendBytes('/api/v1/workspaces/import', zipSync({ 'workspace.json': main }), 'application/zip'), 400);
    expect(missing.error.issues).toEqual([{ path: 'measurements.0.pointsFile', message: 'the zip holds no entry "measurements/measurement-1.json"' }]);
    const whole = zipSync({ 'workspace.json': main, 'measurements/measurement-1.json': strToU8(JSON.stringify(points)) });
    await expectRefused(() => sendBytes('/api/v1/workspaces/import', whole.subarray(0, Math.floor(whole.length / 2)), 'application/zip'), 400);
    // The same zip whole is taken.
    const ok = await sendBytes('/api/v1/workspaces/import', whole, 'application/zip');
    expect(ok.status, JSON.stringify(ok.body)).toBe(201);
    expect(ok.body.created.measurements).toBe(1);
  });

  it('another media type is 415; an empty body and bytes that are not JSON are 400', async () => {
    const text = JSON.stringify(smallWorkspaceFile(MARK));
    await expectRefused(() => sendBytes('/api/v1/workspaces/import', text, 'text/plain'), 415);
    await expectRefused(() => sendBytes('/api/v1/workspaces/import', '', 'application/json'), 400);
    await expectRefused(() => sendBytes('/api/v1/workspaces/import', new Uint8Array([0xff, 0xfe, 0x00, 0x7b]), 'application/json'), 400);
    await expectRefused(() => sendBytes('/api/v1/workspaces/import', text, 'application/zip'), 400);
  });
});
