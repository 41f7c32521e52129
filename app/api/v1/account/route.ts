import { clientAddressOf } from '@/lib/api-limits';
import { requireSessionCaller } from '@/lib/access';
import { requireCaller } from '@/lib/auth';
import { deleteAccount } from '@/lib/data/account-deletion';
import { BODY_LIMIT_BYTES, json, parseJson, route } from '@/lib/http';
import { accountDeleteSchema } from '@/lib/validations/account';

/**
 * DELETE /api/v1/account — deletes the caller's account (a browser session only; documented in lib/openapi/operations):
 * the password again, the typed confirmation, and a decision for every workspace only they own, all in one transaction.
 */
export const DELETE = route(async (request) => {
  const caller = await requireCaller();
  requireSessionCaller(caller, 'Deleting an account');
  const input = await parseJson(request, accountDeleteSchema, BODY_LIMIT_BYTES.form);
  return json(await deleteAccount(caller, input, clientAddressOf(request.headers)));
});
