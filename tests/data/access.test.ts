import { beforeAll, describe, expect, it } from 'vitest';
import { requireMembership, type Caller } from '@/lib/access';
import { createUserWithWorkspace } from '@/lib/data/users';
import { addMember, createWorkspace } from '@/lib/data/workspaces';
import { AppError } from '@/lib/errors';
import { uniqueEmail } from '../helpers/http';
import { testDb } from '../helpers/db';

type Who = 'anonymous' | 'outsider' | 'viewer' | 'editor' | 'owner' | 'admin';
type Need = 'viewer' | 'editor' | 'owner';

// Expected answer of requireMembership for each caller and minimum role: a role, or an HTTP status.
const MATRIX: Record<Who, Record<Need, number | string>> = {
  anonymous: { viewer: 401, editor: 401, owner: 401 },
  outsider: { viewer: 404, editor: 404, owner: 404 },
  // Site admins manage users; they have no implicit access to workspace content.
  admin: { viewer: 404, editor: 404, owner: 404 },
  viewer: { viewer: 'viewer', editor: 403, owner: 403 },
  editor: { viewer: 'editor', editor: 'editor', owner: 403 },
  owner: { viewer: 'owner', editor: 'owner', owner: 'owner' },
};

describe('requireMembership: the one access rule', () => {
  const callers = {} as Record<Who, Caller | null>;
  let workspaceId = '';

  beforeAll(async () => {
    await testDb();
    const make = async (p: string, siteRole: 'admin' | 'member' = 'member') => {
      const u = await createUserWithWorkspace({ email: uniqueEmail(p), name: p, password: 'long-enough-password', siteRole });
      return { id: u.id, siteRole: u.siteRole } as Caller;
    };
    callers.owner = await make('owner');
    callers.editor = await make('editor');
    callers.viewer = await make('viewer');
    callers.outsider = await make('outsider');
    callers.admin = await make('admin', 'admin');
    callers.anonymous = null;
    workspaceId = (await createWorkspace(callers.owner, 'Matrix workspace')).id;
    await addMember(workspaceId, callers.editor.id, 'editor');
    await addMember(workspaceId, callers.viewer.id, 'viewer');
  });

  for (const who of Object.keys(MATRIX) as Who[]) {
    for (const need of ['viewer', 'editor', 'owner'] as Need[]) {
      const expected = MATRIX[who][need];
      it(`${who} asking for ${need} → ${expected}`, async () => {
        const attempt = requireMembership(callers[who], workspaceId, need);
        if (typeof expected === 'string') await expect(attempt).resolves.toBe(expected);
        else {
          const error = await attempt.then(() => null, (e: unknown) => e);
          expect(error).toBeInstanceOf(AppError);
          expect((error as AppError).status).toBe(expected);
        }
      });
    }
  }
});
