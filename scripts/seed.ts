/**
 * The invented demo (README, "Demo data"): workspace "Larkspur AV" (fictional), its users, two Systems.
 * Idempotent: finds what exists by e-mail and name, creates only what is missing.
 */
import { db } from '../lib/db';
import { ensureMeasurement } from '../lib/data/measurements';
import { parseMeasurementText } from '../lib/measurements/parse-measurement';
import { demoMeasurementFiles } from './demo-measurements';
import { ensureProfile } from '../lib/data/profiles';
import { ensureLesson } from '../lib/data/lessons';
import { createSystem } from '../lib/data/systems';
import { createUserWithWorkspace, findUserByEmail } from '../lib/data/users';
import { addMember } from '../lib/data/workspaces';
import { DEMO_PROFILES } from '../lib/demo/profiles';
import { demoLesson } from '../lib/demo/lessons';
import { juniperLaneDocument, lindenStreetDocument } from '../lib/demo/systems';
import { profileFieldsSchema } from '../lib/validations/profile';
import { systemDocumentSchema } from '../lib/validations/system';
import { Membership, System, Workspace } from '../models';

export const DEMO_PASSWORD = 'seamline-demo';
export const DEMO_USERS = {
  owner: { email: 'demo@seamline.test', name: 'Demo Integrator' },
  viewer: { email: 'viewer@seamline.test', name: 'Demo Client' },
  other: { email: 'other@seamline.test', name: 'Other Enthusiast' },
  admin: { email: 'admin@seamline.test', name: 'Site Admin' },
} as const;
export const DEMO_WORKSPACE = 'Larkspur AV';

async function ensureUser(email: string, name: string, siteRole: 'admin' | 'member' = 'member') {
  const existing = await findUserByEmail(email);
  if (existing) return { id: existing.id, siteRole: existing.siteRole };
  const created = await createUserWithWorkspace({ email, name, password: DEMO_PASSWORD, siteRole });
  return { id: created.id, siteRole: created.siteRole };
}

export async function seedDemo(): Promise<string> {
  db();
  const owner = await ensureUser(DEMO_USERS.owner.email, DEMO_USERS.owner.name);
  const viewer = await ensureUser(DEMO_USERS.viewer.email, DEMO_USERS.viewer.name);
  await ensureUser(DEMO_USERS.other.email, DEMO_USERS.other.name);
  await ensureUser(DEMO_USERS.admin.email, DEMO_USERS.admin.name, 'admin');

  const ownedIds = (await Membership.findAll({ where: { userId: owner.id, role: 'owner' } })).map((m) => m.workspaceId);
  let workspace = await Workspace.findOne({ where: { name: DEMO_WORKSPACE, id: ownedIds } });
  if (!workspace) workspace = await Workspace.create({ name: DEMO_WORKSPACE, personal: false });
  await addMember(workspace.id, owner.id, 'owner');
  await addMember(workspace.id, viewer.id, 'viewer');

  const made: string[] = [];
  for (const [name, document] of [
    ['Juniper Lane screening room', juniperLaneDocument()],
    ['Linden Street den', lindenStreetDocument()],
  ] as const) {
    systemDocumentSchema.parse(document);
    if (!(await System.findOne({ where: { workspaceId: workspace.id, name } }))) {
      await createSystem(owner, { name, document, workspaceId: workspace.id, note: 'demo (invented)' });
      made.push(name);
    }
  }

  // The invented demo Speaker profiles, in the workspace's Library (by name and kind, once).
  let profilesAdded = 0;
  for (const profile of DEMO_PROFILES) {
    if (await ensureProfile(workspace.id, owner.id, profileFieldsSchema.parse(profile))) profilesAdded++;
  }

  // Invented measured files of the Juniper Lane room (scripts/demo-measurements.ts), by name, once.
  let measurementsAdded = 0;
  const juniper = await System.findOne({ where: { workspaceId: workspace.id, name: 'Juniper Lane screening room' }, attributes: ['id'] });
  for (const file of demoMeasurementFiles()) {
    const parsed = parseMeasurementText(file.text);
    if (!parsed.ok) throw new Error(`demo measurement ${file.fileName}: ${parsed.message}`);
    if (await ensureMeasurement(workspace.id, juniper?.id ?? null, owner.id, { name: file.name, seat: file.seat, role: file.role, ...(file.runLabel ? { runLabel: file.runLabel } : {}) }, parsed.measurement)) measurementsAdded++;
  }
  const measurementsSummary = measurementsAdded ? `added ${measurementsAdded} invented measurements` : 'measurements already present';

  // The invented demo Lesson "Why the sub and mains cancel" (once, by title).
  const lesson = demoLesson();
  const lessonAdded = await ensureLesson(workspace.id, owner.id, lesson);
  const lessonSummary = lessonAdded ? `added the Lesson "${lesson.title}"` : 'demo Lesson already present';

  return `workspace "${DEMO_WORKSPACE}" ready; ${made.length ? `created ${made.join(', ')}` : 'Systems already present'}; ${profilesAdded ? `added ${profilesAdded} Speaker profiles` : 'Speaker profiles already present'}; ${measurementsSummary}; ${lessonSummary}`;
}
