import { demoProfile } from '@/lib/demo/profiles';
import { juniperLaneDocument, lindenStreetDocument } from '@/lib/demo/systems';
import { testDb } from './db';

/**
 * Shared by the transfer tests (tests/api/workspace-transfer*.test.ts, the access matrix, hostile input): small valid
 * transfer files built by hand from the invented demo content, the comparison of two exports, and row counts.
 */

const T = '2026-11-20T09:30:00.000Z';

/** Eight invented points of a sub measured alone (made up for the tests). */
const points = () => ({ frequencyHz: [20, 25, 31.5, 40, 50, 63, 80, 100], magnitudeDb: [-6, -3, -1, 0, 1, 0, -2, -5], phaseDeg: [170, 150, 120, 90, 60, 30, 0, -40] });

/** A System part with two revisions; `mark` goes into its name so rows can be found on a shared database. */
export function systemPart(mark: string, key = 'system-1', document: unknown = lindenStreetDocument()) {
  const name = `Den ${mark} (invented)`;
  return {
    key,
    name,
    revisions: [
      { revision: 1, name, note: 'created', createdAt: T, authorEmail: null, document, libraryKeys: {} },
      { revision: 2, name, note: `second save ${mark}`, createdAt: '2026-11-21T10:00:00.000Z', authorEmail: null, document, libraryKeys: {} },
    ],
  };
}

export function measurementPart(systemKey: string | null, key = 'measurement-1') {
  return {
    key,
    systemKey,
    name: 'Sofa: sub alone (invented)',
    seat: 'Sofa',
    role: 'sub',
    runLabel: null,
    sourceFormat: 'text' as const,
    sampleRateHz: null,
    arrivalMs: null,
    impulseWindow: null,
    createdAt: T,
    createdByEmail: null,
    points: points(),
  };
}

export function profilePart(key = 'profile-1') {
  const { id: _id, ...fields } = demoProfile('quillon-b6');
  void _id;
  return { ...fields, key, createdAt: T, updatedAt: T, createdByEmail: null };
}

/** A small valid workspace file: one profile, one System (two revisions), one measurement of it, one Lesson of one Step. */
export function smallWorkspaceFile(mark: string) {
  return {
    format: 'seamline-workspace',
    version: 1,
    exportedAt: T,
    workspace: { name: `Transfer ${mark} (invented)` },
    members: [{ email: 'someone.invented@example.test', role: 'owner' }],
    profiles: [profilePart()],
    systems: [systemPart(mark)],
    measurements: [measurementPart('system-1')],
    lessons: [
      {
        key: 'lesson-1',
        title: `Lesson ${mark} (invented)`,
        description: 'Invented.',
        createdAt: T,
        updatedAt: T,
        ownerEmail: null,
        steps: [{ title: 'One', points: '- invented', panel: 'blend', traces: ['sum'], sweep: null, document: juniperLaneDocument(), libraryKeys: {} }],
      },
    ],
  };
}

/** A small valid System file: one System (two revisions) and one measurement of it. */
export function smallSystemFile(mark: string) {
  return { format: 'seamline-system', version: 1, exportedAt: T, system: systemPart(mark), profiles: [], measurements: [measurementPart('system-1')] };
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- files are compared as plain JSON
type Json = any;

/**
 * Two exports made comparable: the export time and the member list dropped (members are never imported), each key
 * replaced by what it names (a System by its name, a Library profile by kind and name), and each person the workspace
 * imported into does not hold replaced by null (their work reads "a former member" there). Everything else — names,
 * revision numbers, notes, times, documents, points, Steps, order — must be equal.
 */
export function comparable(file: Json, membersThere: ReadonlySet<string>): Json {
  const f = structuredClone(file);
  const systems = f.format === 'seamline-system' ? [f.system] : f.systems;
  const systemName = new Map<string, string>(systems.map((s: Json) => [s.key, s.name]));
  const profileName = new Map<string, string>(f.profiles.map((p: Json) => [p.key, `${p.kind}:${p.name}`]));
  const person = (email: string | null) => (email && membersThere.has(email) ? email : null);
  const links = (l: Record<string, string>) => Object.fromEntries(Object.entries(l).map(([id, k]) => [id, profileName.get(k) ?? `missing ${k}`]));
  delete f.exportedAt;
  delete f.members;
  for (const p of f.profiles) {
    delete p.key;
    p.createdByEmail = person(p.createdByEmail);
  }
  for (const s of systems) {
    delete s.key;
    for (const r of s.revisions) {
      r.authorEmail = person(r.authorEmail);
      r.libraryKeys = links(r.libraryKeys);
    }
  }
  for (const m of f.measurements) {
    delete m.key;
    m.systemKey = m.systemKey === null ? null : (systemName.get(m.systemKey) ?? `missing ${m.systemKey}`);
    m.createdByEmail = person(m.createdByEmail);
  }
  for (const l of f.lessons ?? []) {
    delete l.key;
    l.ownerEmail = person(l.ownerEmail);
    for (const s of l.steps) s.libraryKeys = links(s.libraryKeys);
  }
  return f;
}

/** How many rows of each kind a user can reach through their memberships, and how many rows carry `mark` in their name. */
export async function rowCounts(userId: string, mark: string): Promise<Record<string, number>> {
  const db = await testDb();
  const [row] = (await db.query(
    `SELECT
       (SELECT count(*)::int FROM memberships WHERE user_id = :userId) AS memberships,
       (SELECT count(*)::int FROM systems WHERE workspace_id IN (SELECT workspace_id FROM memberships WHERE user_id = :userId)) AS systems,
       (SELECT count(*)::int FROM measurements WHERE workspace_id IN (SELECT workspace_id FROM memberships WHERE user_id = :userId)) AS measurements,
       (SELECT count(*)::int FROM lessons WHERE workspace_id IN (SELECT workspace_id FROM memberships WHERE user_id = :userId)) AS lessons,
       (SELECT count(*)::int FROM speaker_profiles WHERE workspace_id IN (SELECT workspace_id FROM memberships WHERE user_id = :userId)) AS profiles,
       (SELECT count(*)::int FROM systems WHERE name LIKE :like) AS markedSystems,
       (SELECT count(*)::int FROM workspaces WHERE name LIKE :like) AS markedWorkspaces`,
    { replacements: { userId, like: `%${mark}%` }, type: 'SELECT' },
  )) as Record<string, number>[];
  return row as Record<string, number>;
}
