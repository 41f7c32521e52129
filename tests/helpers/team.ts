import { expect } from 'vitest';
import { createUserWithWorkspace } from '@/lib/data/users';
import { addMember, createWorkspace } from '@/lib/data/workspaces';
import { lindenStreetDocument } from '@/lib/demo/systems';
import { Client, signedInClient, uniqueEmail } from './http';
import { testDb } from './db';

export const TEAM_PASSWORD = 'library-test-password';
export type Who = 'anonymous' | 'outsider' | 'viewer' | 'editor' | 'owner';
export const WHO: Who[] = ['anonymous', 'outsider', 'viewer', 'editor', 'owner'];

export interface Team {
  workspaceId: string;
  ids: Record<Exclude<Who, 'anonymous'>, string>;
  clients: Record<Who, Client>;
}

/** A fresh workspace with an owner, an editor and a viewer, plus an outsider (who has only their own). */
export async function makeTeam(label: string): Promise<Team> {
  await testDb();
  const ids = {} as Team['ids'];
  const clients = { anonymous: new Client() } as Team['clients'];
  for (const who of ['owner', 'editor', 'viewer', 'outsider'] as const) {
    const email = uniqueEmail(`${label}-${who}`);
    const u = await createUserWithWorkspace({ email, name: `${label} ${who}`, password: TEAM_PASSWORD });
    ids[who] = u.id;
    clients[who] = await signedInClient(email, TEAM_PASSWORD);
  }
  const workspaceId = (await createWorkspace({ id: ids.owner, siteRole: 'member' }, `${label} workspace (invented)`)).id;
  await addMember(workspaceId, ids.editor, 'editor');
  await addMember(workspaceId, ids.viewer, 'viewer');
  return { workspaceId, ids, clients };
}

/** The team owner saves a System in the team's workspace (201 expected). */
export async function createTeamSystem(team: Team, name = 'Matrix room (invented)', document: unknown = lindenStreetDocument()) {
  const res = await team.clients.owner.post('/api/v1/systems', { name, document, workspaceId: team.workspaceId });
  expect(res.status, res.text).toBe(201);
  return res.body as { id: string; revision: number; name: string; document: ReturnType<typeof lindenStreetDocument> };
}
