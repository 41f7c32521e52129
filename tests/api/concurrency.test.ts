import { beforeAll, describe, expect, it } from 'vitest';
import { addMember } from '@/lib/data/workspaces';
import { juniperLaneDocument } from '@/lib/demo/systems';
import { Client, signedInClient, uniqueEmail } from '../helpers/http';
import { testDb } from '../helpers/db';

/**
 * Concurrent edits (issue 8): 20 clients save the same System (and the same Lesson) at once with
 * the same revision. Exactly one save per revision succeeds and every other gets 409 with the
 * current revision; the losers re-read and try again, round after round. Afterwards the revision
 * history has no gaps and every save that was answered 2xx is found, as sent, at its revision.
 */

const CLIENTS = 20;
const ROUNDS = 5;
const MARK = `conc${Date.now().toString(36)}`;

interface Team {
  workspaceId: string;
  clients: Client[];
  owner: Client;
}

async function signUp(prefix: string): Promise<{ id: string; email: string }> {
  const email = uniqueEmail(`${MARK}-${prefix}`);
  const res = await new Client().post('/api/v1/auth/sign-up', { name: `Concurrent ${prefix}`, email, password: 'a-long-password-1' });
  if (res.status !== 201) throw new Error(`fixture: sign-up ${res.status} ${res.text}`);
  return { id: res.body.id, email };
}

/** One save as a client sent it, and what the server answered. */
interface Attempt {
  client: number;
  round: number;
  sentRevision: number;
  status: number;
  answeredRevision: number | null;
  currentRevision: number | null;
  marker: string;
}

/**
 * Runs the rounds: in round 1 every client saves on `startRevision`; in each later round only the
 * clients that lost so far re-read and save again. `save` fires one save; `read` reads the revision.
 */
async function rounds(save: (client: number, round: number, revision: number, marker: string) => Promise<{ status: number; body: { revision?: number; error?: { currentRevision?: number } } }>, read: (client: number) => Promise<number>, startRevision: number) {
  const attempts: Attempt[] = [];
  let waiting = Array.from({ length: CLIENTS }, (_, i) => i);
  let revision = startRevision;
  for (let round = 1; round <= ROUNDS && waiting.length > 0; round++) {
    // Every waiting client has read the same revision before anyone saves.
    const seen = await Promise.all(waiting.map((c) => (round === 1 ? Promise.resolve(revision) : read(c))));
    const answers = await Promise.all(
      waiting.map(async (c, i) => {
        const marker = `${MARK} c${String(c).padStart(2, '0')} r${round}`;
        const res = await save(c, round, seen[i]!, marker);
        return {
          client: c,
          round,
          sentRevision: seen[i]!,
          status: res.status,
          answeredRevision: res.status < 300 ? (res.body.revision ?? null) : null,
          currentRevision: res.status === 409 ? (res.body.error?.currentRevision ?? null) : null,
          marker,
        } satisfies Attempt;
      }),
    );
    attempts.push(...answers);
    expect(new Set(seen), `round ${round}: every client read the same revision`).toEqual(new Set([revision]));
    const won = answers.filter((a) => a.status === 200);
    const lost = answers.filter((a) => a.status === 409);
    expect({ round, won: won.length, lost: lost.length, other: answers.length - won.length - lost.length }).toEqual({ round, won: 1, lost: waiting.length - 1, other: 0 });
    expect(won[0]!.answeredRevision, `round ${round}: the winner's answer carries the new revision`).toBe(revision + 1);
    for (const l of lost) expect(l.currentRevision, `round ${round}: a 409 names the current revision`).toBe(revision + 1);
    revision += 1;
    waiting = lost.map((l) => l.client);
  }
  return { attempts, finalRevision: revision };
}

describe('concurrent saves', () => {
  const team = {} as Team;

  beforeAll(async () => {
    await testDb();
    const owner = await signUp('owner');
    const editor = await signUp('editor');
    team.owner = await signedInClient(owner.email, 'a-long-password-1');
    const ws = await team.owner.post('/api/v1/workspaces', { name: `Concurrency ${MARK}` });
    team.workspaceId = ws.body.id;
    await addMember(team.workspaceId, editor.id, 'editor');
    // 20 separate sessions: half the owner's, half an editor's.
    team.clients = [];
    for (let i = 0; i < CLIENTS; i++) team.clients.push(await signedInClient(i % 2 ? editor.email : owner.email, 'a-long-password-1'));
  }, 120_000);

  it(`${CLIENTS} clients saving one System at once: one 200 and ${CLIENTS - 1} × 409 per revision, ${ROUNDS} rounds, no gaps, nothing lost`, async () => {
    const created = await team.owner.post('/api/v1/systems', { name: `Concurrent ${MARK}`, document: juniperLaneDocument(), workspaceId: team.workspaceId });
    expect(created.status).toBe(201);
    const id: string = created.body.id;
    const start: number = created.body.revision;
    const documentFor = (client: number, marker: string) => {
      const d = juniperLaneDocument();
      return { ...d, notes: marker, bassManagement: { ...d.bassManagement, crossoverHz: 60 + client } };
    };

    const { attempts, finalRevision } = await rounds(
      (c, _round, revision, marker) => team.clients[c]!.put(`/api/v1/systems/${id}`, { name: marker, document: documentFor(c, marker), revision }),
      async (c) => (await team.clients[c]!.get(`/api/v1/systems/${id}`)).body.revision,
      start,
    );
    const winners = attempts.filter((a) => a.status === 200);
    expect(winners).toHaveLength(ROUNDS);
    expect(finalRevision).toBe(start + ROUNDS);

    // History: every revision from 1 to the last, once each, newest first.
    const history = await team.owner.get(`/api/v1/systems/${id}/revisions`);
    expect(history.status).toBe(200);
    const numbers: number[] = history.body.items.map((r: { revision: number }) => r.revision);
    expect(numbers).toEqual(Array.from({ length: finalRevision }, (_, i) => finalRevision - i));

    // Nothing lost: each 2xx save is found, as sent, at its revision; no loser's marker is anywhere.
    for (const w of winners) {
      const rev = await team.owner.get(`/api/v1/systems/${id}/revisions/${w.answeredRevision}`);
      expect(rev.status).toBe(200);
      expect({ name: rev.body.name, notes: rev.body.document.notes, crossoverHz: rev.body.document.bassManagement.crossoverHz }).toEqual({ name: w.marker, notes: w.marker, crossoverHz: 60 + w.client });
    }
    const losers = new Set(attempts.filter((a) => a.status === 409).map((a) => a.marker));
    const stored = await Promise.all(numbers.map(async (n) => (await team.owner.get(`/api/v1/systems/${id}/revisions/${n}`)).body.name as string));
    expect(stored.filter((name) => losers.has(name))).toEqual([]);
    const now = await team.owner.get(`/api/v1/systems/${id}`);
    expect({ revision: now.body.revision, name: now.body.name }).toEqual({ revision: finalRevision, name: winners[winners.length - 1]!.marker });

    // The database agrees: one revision row per number.
    const db = await testDb();
    const rows = (await db.query('SELECT revision FROM system_revisions WHERE system_id = :id ORDER BY revision', { replacements: { id }, type: 'SELECT' })) as { revision: number }[];
    expect(rows.map((r) => r.revision)).toEqual(Array.from({ length: finalRevision }, (_, i) => i + 1));
  }, 180_000);

  it(`${CLIENTS} clients saving one Lesson at once: one 200 and ${CLIENTS - 1} × 409 per revision, ${ROUNDS} rounds, each winner's title kept`, async () => {
    const created = await team.owner.post('/api/v1/lessons', { title: `Concurrent lesson ${MARK}`, workspaceId: team.workspaceId });
    expect(created.status).toBe(201);
    const id: string = created.body.id;
    const start: number = created.body.revision;
    const afterRound: { revision: number; title: string; description: string }[] = [];

    const { attempts, finalRevision } = await rounds(
      async (c, _round, revision, marker) => {
        const res = await team.clients[c]!.put(`/api/v1/lessons/${id}`, { title: marker, description: `Saved by client ${c} (invented).`, revision });
        return res;
      },
      async (c) => {
        // Each re-read also records what the previous round left behind.
        const l = (await team.clients[c]!.get(`/api/v1/lessons/${id}`)).body;
        afterRound.push({ revision: l.revision, title: l.title, description: l.description });
        return l.revision;
      },
      start,
    );
    const winners = attempts.filter((a) => a.status === 200);
    expect(winners).toHaveLength(ROUNDS);
    expect(finalRevision).toBe(start + ROUNDS);
    // Between rounds, the Lesson held exactly the previous round's winner.
    for (const seen of afterRound) {
      const w = winners.find((x) => x.answeredRevision === seen.revision);
      expect(w, `a winner saved revision ${seen.revision}`).toBeDefined();
      expect({ title: seen.title, description: seen.description }).toEqual({ title: w!.marker, description: `Saved by client ${w!.client} (invented).` });
    }
    expect(winners.map((w) => w.answeredRevision)).toEqual(Array.from({ length: ROUNDS }, (_, i) => start + i + 1));
    const now = await team.owner.get(`/api/v1/lessons/${id}`);
    expect({ revision: now.body.revision, title: now.body.title }).toEqual({ revision: finalRevision, title: winners[winners.length - 1]!.marker });
  }, 180_000);
});
