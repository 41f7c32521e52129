import { UniqueConstraintError } from 'sequelize';
import { db } from '@/lib/db';
import { invalid } from '@/lib/errors';
import { hashPassword } from '@/lib/passwords';
import type { SignUpInput } from '@/lib/validations/auth';
import { isUuid } from '@/lib/validations/common';
import { Membership, User, Workspace, type SiteRole } from '@/models';

export interface AppUser {
  id: string;
  email: string;
  name: string;
  siteRole: SiteRole;
  createdAt: string;
}

export const toAppUser = (u: User): AppUser => ({ id: u.id, email: u.email, name: u.name, siteRole: u.siteRole, createdAt: u.createdAt.toISOString() });

const duplicateEmail = () => invalid('An account with that e-mail already exists. Sign in, or reset your password.', [{ path: 'email', message: 'an account with that e-mail already exists' }]);

/** Creates a user and the personal workspace they own, in one transaction. */
export async function createUserWithWorkspace(input: SignUpInput & { siteRole?: SiteRole }): Promise<AppUser> {
  const sequelize = db();
  const passwordHash = await hashPassword(input.password);
  try {
    return await sequelize.transaction(async (transaction) => {
      if (await User.findOne({ where: { email: input.email }, transaction })) throw duplicateEmail();
      const user = await User.create({ email: input.email, name: input.name, passwordHash, siteRole: input.siteRole ?? 'member' }, { transaction });
      const workspace = await Workspace.create({ name: `${input.name}'s workspace`, personal: true }, { transaction });
      await Membership.create({ workspaceId: workspace.id, userId: user.id, role: 'owner' }, { transaction });
      return toAppUser(user);
    });
  } catch (e) {
    if (e instanceof UniqueConstraintError) throw duplicateEmail();
    throw e;
  }
}

export async function findUserByEmail(email: string): Promise<User | null> {
  db();
  return User.findOne({ where: { email: email.trim().toLowerCase() } });
}

/**
 * The account a browser session names, read afresh on every request that needs a caller: a deleted account's
 * session (its cookie is good for 30 days) then finds nothing, and a changed name or site role shows at once.
 */
export async function findSessionUser(id: string): Promise<Pick<User, 'id' | 'email' | 'name' | 'siteRole'> | null> {
  if (!isUuid(id)) return null;
  db();
  return User.findByPk(id, { attributes: ['id', 'email', 'name', 'siteRole'] });
}

export async function listUsers(): Promise<(AppUser & { workspaceCount: number })[]> {
  db();
  const users = await User.findAll({ order: [['createdAt', 'ASC']], include: [{ model: Membership, as: 'memberships', attributes: ['id'] }] });
  return users.map((u) => ({ ...toAppUser(u), workspaceCount: ((u as unknown as { memberships?: unknown[] }).memberships ?? []).length }));
}
