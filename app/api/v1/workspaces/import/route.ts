import { requireMembership, requireSessionCaller } from '@/lib/access';
import { requireCaller } from '@/lib/auth';
import { importWorkspaceFile } from '@/lib/data/workspace-import';
import { readTransferFile } from '@/lib/data/workspace-import-package';
import { json, parseQuery, route } from '@/lib/http';
import { workspaceImportQuerySchema } from '@/lib/validations/workspace-transfer';

/**
 * A whole-workspace transfer file as the body (application/json or application/zip): validated whole, then created
 * in one transaction as a new workspace the caller owns, or with `?workspaceId=` in an existing empty one they own.
 */
export const POST = route(async (request) => {
  const caller = await requireCaller();
  requireSessionCaller(caller, 'Importing a workspace');
  const { workspaceId } = parseQuery(request, workspaceImportQuerySchema);
  // The caller's rights first, so nothing of the file is read for a caller who may not import there.
  if (workspaceId) await requireMembership(caller, workspaceId, 'owner', 'That workspace');
  const file = await readTransferFile(request);
  return json(await importWorkspaceFile(caller, file, { workspaceId }), 201);
});
