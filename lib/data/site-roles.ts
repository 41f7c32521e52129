import { requireSiteAdmin, type Caller } from '@/lib/access';
import { db } from '@/lib/db';
import { conflict, notFound } from '@/lib/errors';
import type { Transaction } from 'sequelize';
import { User, type SiteRole } from '@/models';
import { isLastSiteAdmin } from './account-deletion-plan';
import { assertUuid } from './ids';
import { toAppUser, type AppUser } from './users';

/** Why the last site admin cannot be made a member (the same rule as deleting that account). */
export const LAST_SITE_ADMIN_MESSAGE = 'That account is the only site admin. Seamline needs one to manage accounts: make another account a site admin first.';

/**
 * A site administrator sets an account's site role (their own too). The admins are locked while it is decided, so two
 * admins demoting each other at once cannot leave the site with none. Setting the role an account already has changes
 * nothing and answers the account as it is.
 */
export async function setSiteRole(caller: Caller | null, userId: string, siteRole: SiteRole, outer?: Transaction): Promise<AppUser> {
  requireSiteAdmin(caller);
  assertUuid(userId, 'That account');
  const decide = async (transaction: Transaction) => {
    const user = await User.findByPk(userId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user) throw notFound('That account');
    if (user.siteRole === siteRole) return toAppUser(user);
    if (siteRole === 'member' && (await isLastSiteAdmin(user, transaction))) throw conflict(LAST_SITE_ADMIN_MESSAGE);
    await user.update({ siteRole }, { transaction });
    return toAppUser(user);
  };
  // `outer`: a caller's own transaction (the tests decide inside one they roll back).
  return outer ? decide(outer) : db().transaction(decide);
}
