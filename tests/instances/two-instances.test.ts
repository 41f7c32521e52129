/**
 * Two production instances of the app on one PostgreSQL, side by side (README, "Several app instances on one
 * PostgreSQL"): a save through one is read through the other, a stale save through either is a 409, the sign-in
 * limit counts the failures both have seen, a share link revoked on one is gone on the other at once, and a
 * session made on one is honoured by the other. `npm test` starts the two instances (scripts/lib/instances.ts);
 * by hand, after a build: `npm run test:instances`. Every run signs up its own people and makes its own System,
 * so reruns on the same database pass.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { juniperLaneDocument } from '@/lib/demo/systems';
import { SIGN_IN_FAILURES_PER_EMAIL } from '@/lib/rate-limit';
import { Client as Browser } from '../helpers/http';

const A = (process.env.INSTANCE_A_URL ?? '').replace(/\/$/, '');
const B = (process.env.INSTANCE_B_URL ?? '').replace(/\/$/, '');
const missing = [
  ['INSTANCE_A_URL', A],
  ['INSTANCE_B_URL', B],
].flatMap(([name, value]) => (value ? [] : [name]));
if (missing.length) {
  console.warn(`two-instances: skipped, ${missing.join(' and ')} not set. \`npm run test:instances\` (or npm test) starts two instances and sets both.`);
}

const PASSWORD = 'two-instances-password-1';
const runId = `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 7)}`;
const emailFor = (what: string) => `instances-${what}-${runId}@example.test`;
// A made-up client address for every sign-in attempt, so only the per-e-mail count is at work (not the per-address one).
const octet = () => Math.floor(Math.random() * 254) + 1;
const addressPrefix = `10.${octet()}.${octet()}`;
let attempts = 0;
const nextAddress = () => `${addressPrefix}.${(attempts++ % 254) + 1}`;

const signUp = async (base: string, what: string) => {
  const email = emailFor(what);
  const res = await new Browser().requestAt(base, 'POST', '/api/v1/auth/sign-up', { name: `Instances ${what} (invented)`, email, password: PASSWORD });
  expect(res.status, res.text).toBe(201);
  return email;
};

const signInOnce = (base: string, email: string, password: string) => new Browser().signInAt(base, email, password, nextAddress());

describe.skipIf(missing.length > 0)('two app instances on one PostgreSQL', () => {
  let owner: Browser;
  let ownerEmail: string;
  const systemName = `Two instances ${runId} (invented)`;

  /** A fresh System made through A; its id and revision. */
  const freshSystem = async () => {
    const res = await owner.requestAt(A, 'POST', '/api/v1/systems', { name: systemName, document: juniperLaneDocument() });
    expect(res.status, res.text).toBe(201);
    return res.body as { id: string; revision: number; document: ReturnType<typeof juniperLaneDocument> };
  };
  const save = (base: string, id: string, revision: number, notes: string) =>
    owner.requestAt(base, 'PUT', `/api/v1/systems/${id}`, { name: systemName, document: { ...juniperLaneDocument(), notes }, revision });

  beforeAll(async () => {
    expect(A).not.toBe(B);
    ownerEmail = await signUp(A, 'owner');
    owner = new Browser();
    expect(await owner.signInAt(A, ownerEmail, PASSWORD, nextAddress())).toBeNull();
    expect(owner.signedIn).toBe(true);
  });

  it('a session cookie from signing in on A is honoured on B', async () => {
    const session = await owner.requestAt(B, 'GET', '/api/auth/session');
    expect(session.status).toBe(200);
    expect(session.body.user.email).toBe(ownerEmail);
    const workspaces = await owner.requestAt(B, 'GET', '/api/v1/workspaces');
    expect(workspaces.status, workspaces.text).toBe(200);
    expect(workspaces.body.items).toHaveLength(1);
    expect(workspaces.body.items[0]).toMatchObject({ personal: true, role: 'owner' });
    // Without the cookie, B does not know the caller.
    expect((await new Browser().requestAt(B, 'GET', '/api/v1/workspaces')).status).toBe(401);
  });

  it('a save through A is read through B at the new revision with the same document', async () => {
    const s = await freshSystem();
    const saved = await save(A, s.id, s.revision, `saved through A, run ${runId}`);
    expect(saved.status, saved.text).toBe(200);
    expect(saved.body.revision).toBe(s.revision + 1);

    const read = await owner.requestAt(B, 'GET', `/api/v1/systems/${s.id}`);
    expect(read.status, read.text).toBe(200);
    expect(read.body.revision).toBe(s.revision + 1);
    expect(read.body.document.notes).toBe(`saved through A, run ${runId}`);
    expect(read.body.document).toEqual(saved.body.document);
  });

  it('a stale save is a 409 on either instance and changes nothing', async () => {
    const s = await freshSystem();
    const r = s.revision;
    // Saved on A; B is sent the revision it started from.
    expect((await save(A, s.id, r, 'first, through A')).status).toBe(200);
    const staleOnB = await save(B, s.id, r, 'stale, through B');
    expect(staleOnB.status, staleOnB.text).toBe(409);
    expect(staleOnB.body.error.currentRevision).toBe(r + 1);
    const afterB = await owner.requestAt(A, 'GET', `/api/v1/systems/${s.id}`);
    expect([afterB.body.revision, afterB.body.document.notes]).toEqual([r + 1, 'first, through A']);

    // And the reverse: saved on B, stale on A.
    expect((await save(B, s.id, r + 1, 'second, through B')).status).toBe(200);
    const staleOnA = await save(A, s.id, r + 1, 'stale, through A');
    expect(staleOnA.status, staleOnA.text).toBe(409);
    expect(staleOnA.body.error.currentRevision).toBe(r + 2);
    const afterA = await owner.requestAt(B, 'GET', `/api/v1/systems/${s.id}`);
    expect([afterA.body.revision, afterA.body.document.notes]).toEqual([r + 2, 'second, through B']);
  });

  it('two saves from the same revision sent to A and B at once: exactly one is kept, the other is a 409', async () => {
    const s = await freshSystem();
    const [onA, onB] = await Promise.all([save(A, s.id, s.revision, 'race, through A'), save(B, s.id, s.revision, 'race, through B')]);
    expect([onA.status, onB.status].sort((x, y) => x - y)).toEqual([200, 409]);
    const winner = onA.status === 200 ? 'race, through A' : 'race, through B';
    const read = await owner.requestAt(B, 'GET', `/api/v1/systems/${s.id}`);
    expect([read.body.revision, read.body.document.notes]).toEqual([s.revision + 1, winner]);
    const history = await owner.requestAt(A, 'GET', `/api/v1/systems/${s.id}/revisions`);
    expect(history.status, history.text).toBe(200);
    expect(history.body.items.map((i: { revision: number }) => i.revision).sort((x: number, y: number) => x - y)).toEqual([s.revision, s.revision + 1]);
  });

  it(`the sign-in limit (${SIGN_IN_FAILURES_PER_EMAIL} failures per e-mail) counts the failures both instances have seen`, async () => {
    // Neither instance alone sees the limit's worth of failures when they alternate.
    expect(Math.ceil(SIGN_IN_FAILURES_PER_EMAIL / 2)).toBeLessThan(SIGN_IN_FAILURES_PER_EMAIL);
    const oneInstance = await signUp(A, 'limit-one');
    const twoInstances = await signUp(B, 'limit-two');
    const alternate = (i: number) => (i % 2 === 0 ? A : B);

    // On one instance: the limit's failures are told "do not match", the next attempt is refused.
    const alone: (string | null)[] = [];
    for (let i = 0; i <= SIGN_IN_FAILURES_PER_EMAIL; i++) alone.push(await signInOnce(A, oneInstance, 'not-the-password'));
    // Alternating A, B, A, …: the refusal comes at the same total count.
    const shared: (string | null)[] = [];
    for (let i = 0; i <= SIGN_IN_FAILURES_PER_EMAIL; i++) shared.push(await signInOnce(alternate(i), twoInstances, 'not-the-password'));

    for (const answers of [alone, shared]) {
      expect(answers.slice(0, SIGN_IN_FAILURES_PER_EMAIL).every((e) => e !== null && /do not match/.test(e)), answers.join(' | ')).toBe(true);
      expect(answers[SIGN_IN_FAILURES_PER_EMAIL]).toMatch(/Too many failed sign-ins/);
    }
    // The right password is refused on both while the limit holds, and no session cookie is set.
    for (const base of [A, B]) {
      const browser = new Browser();
      expect(await browser.signInAt(base, twoInstances, PASSWORD, nextAddress())).toMatch(/Too many failed sign-ins/);
      expect(browser.signedIn).toBe(false);
    }
  });

  it('a share link made on A opens on B; revoked on A, it is 404 on B at once', async () => {
    const s = await freshSystem();
    const made = await owner.requestAt(A, 'POST', `/api/v1/systems/${s.id}/share-links`);
    expect(made.status, made.text).toBe(201);
    const token = made.body.token as string;

    const opened = await new Browser().requestAt(B, 'GET', `/s/${token}`);
    expect(opened.status).toBe(200);
    expect(opened.text).toContain(systemName);

    const revoked = await owner.requestAt(A, 'DELETE', `/api/v1/share-links/${token}`);
    expect(revoked.status, revoked.text).toBe(200);
    expect((await new Browser().requestAt(B, 'GET', `/s/${token}`)).status).toBe(404);
    expect((await new Browser().requestAt(A, 'GET', `/s/${token}`)).status).toBe(404);
    const listedOnB = await owner.requestAt(B, 'GET', `/api/v1/systems/${s.id}/share-links`);
    expect(listedOnB.body.items.map((l: { token: string }) => l.token)).not.toContain(token);
  });
});
