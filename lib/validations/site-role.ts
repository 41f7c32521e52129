import { z } from 'zod';

/** PATCH /api/v1/admin/users/{id}: a site administrator sets an account's site role. */
export const siteRoleUpdateSchema = z
  .strictObject({
    siteRole: z
      .enum(['admin', 'member'], { error: "siteRole must be 'admin' or 'member'" })
      .meta({ description: "admin: manages accounts (and no workspace content by that alone); member: everyone else. The last site admin cannot be made a member." }),
  })
  .meta({ description: 'The new site role.' });
